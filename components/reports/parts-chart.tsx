import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import { BottomAxis, Gridlines, LeftAxis } from "@/components/charts/axes";
import { seriesColour } from "@/components/charts/colors";
import { ChartFrame, plotArea } from "@/components/charts/frame";
import { spacedLabels, wholeTicks } from "@/components/charts/ticks";

type Month = { label: string } & Record<string, number | string>;

/** Parts replaced per month, stacked by part. */
export function PartsChart({ months, parts }: { months: Month[]; parts: { slug: string; name: string }[] }) {
  const plot = plotArea(640, 300, { top: 12, right: 16, bottom: 28, left: 40 });
  const stacks = months.map((m) => {
    let below = 0;
    return parts.map((p) => {
      const n = Number(m[p.slug] ?? 0);
      below += n;
      return { part: p, n, from: below - n, to: below };
    });
  });
  const ticks = wholeTicks(Math.max(0, ...stacks.map((s) => s.at(-1)?.to ?? 0)));
  const x = scaleBand({ domain: months.map((m) => m.label), range: [0, plot.innerWidth], padding: 0.2, round: true });
  const y = scaleLinear({ domain: [0, ticks.at(-1)!], range: [plot.innerHeight, 0], round: true });
  return (
    <ChartFrame plot={plot} label="Parts replaced per month; the table lists the same numbers"
      legend={parts.map((p, i) => ({ name: p.name, colour: seriesColour(i), mark: "bar" }))}>
      <Gridlines scale={y} plot={plot} ticks={ticks} />
      {months.map((m, i) => stacks[i].filter((s) => s.n > 0).map((s) => (
        <Bar key={`${m.label}-${s.part.slug}`} x={x(m.label)} y={y(s.to)} width={x.bandwidth()} height={y(s.from) - y(s.to)}
          fill={seriesColour(parts.indexOf(s.part))}>
          <title>{`${m.label}, ${s.part.name}: ${s.n}`}</title>
        </Bar>
      )))}
      <LeftAxis scale={y} plot={plot} ticks={ticks} />
      <BottomAxis scale={x} plot={plot} ticks={spacedLabels(months.map((m) => m.label), 10)} />
    </ChartFrame>
  );
}
