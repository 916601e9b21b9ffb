import { scaleLinear, scalePoint } from "@visx/scale";
import { LinePath } from "@visx/shape";
import { BottomAxis, Gridlines, LeftAxis } from "@/components/charts/axes";
import { seriesColour } from "@/components/charts/colors";
import { ChartFrame, plotArea } from "@/components/charts/frame";
import { spacedLabels, wholeTicks } from "@/components/charts/ticks";

type Month = { label: string } & Record<string, number | string>;
const count = (m: Month, key: string) => Number(m[key] ?? 0);

/** Closed cases per month, one line per cause. */
export function TrendChart({ months, series }: { months: Month[]; series: { key: string; name: string }[] }) {
  const plot = plotArea(720, 300, { top: 12, right: 16, bottom: 28, left: 40 });
  const x = scalePoint({ domain: months.map((m) => m.label), range: [0, plot.innerWidth], padding: 0.5, round: true });
  const ticks = wholeTicks(Math.max(0, ...months.flatMap((m) => series.map((s) => count(m, s.key)))));
  const y = scaleLinear({ domain: [0, ticks.at(-1)!], range: [plot.innerHeight, 0], round: true });
  return (
    <ChartFrame plot={plot} label="Closed cases per month by cause; the table lists the same numbers"
      legend={series.map((s, i) => ({ name: s.name, colour: seriesColour(i), mark: "line" }))}>
      <Gridlines scale={y} plot={plot} ticks={ticks} />
      {series.map((s, i) => (
        <LinePath key={s.key} data={months} x={(m) => x(m.label) ?? 0} y={(m) => y(count(m, s.key))} fill="none" stroke={seriesColour(i)} strokeWidth={2} />
      ))}
      {/* One hover column per month, naming every cause's count in it: easier to hit than a point on
          a line, and a month's causes read side by side. */}
      {months.map((m) => (
        <rect key={m.label} x={(x(m.label) ?? 0) - x.step() / 2} y={0} width={x.step()} height={plot.innerHeight} fill="transparent">
          <title>{`${m.label}: ${series.map((s) => `${s.name} ${count(m, s.key)}`).join(", ")}`}</title>
        </rect>
      ))}
      <LeftAxis scale={y} plot={plot} ticks={ticks} />
      <BottomAxis scale={x} plot={plot} ticks={spacedLabels(months.map((m) => m.label), 12)} />
    </ChartFrame>
  );
}
