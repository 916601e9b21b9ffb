import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar, LinePath } from "@visx/shape";
import { BottomAxis, Gridlines, LeftAxis } from "@/components/charts/axes";
import { COPPER, INK } from "@/components/charts/colors";
import { ChartFrame, plotArea } from "@/components/charts/frame";
import { percentTick, percentValue } from "@/components/charts/ticks";

export interface CalibrationPoint {
  bin: string;
  n: number;
  predicted: number;
  observed: number;
}


/** Per bin of the top probability: how often the top cause was confirmed (bars) against what the tree said (line). */
export function CalibrationChart({ points }: { points: CalibrationPoint[] }) {
  const plot = plotArea(640, 300, { top: 12, right: 16, bottom: 28, left: 48 });
  const x = scaleBand({ domain: points.map((p) => p.bin), range: [0, plot.innerWidth], padding: 0.2, round: true });
  const y = scaleLinear({ domain: [0, 100], range: [plot.innerHeight, 0], round: true });
  const centre = (p: CalibrationPoint) => (x(p.bin) ?? 0) + x.bandwidth() / 2;
  return (
    <ChartFrame plot={plot} label="Calibration of the top-ranked cause; the table lists the same numbers"
      legend={[{ name: "Top cause confirmed", colour: COPPER, mark: "bar" }, { name: "Probability the tree gave it", colour: INK, mark: "dashed" }]}>
      <Gridlines scale={y} plot={plot} />
      {points.map((p) => (
        <Bar key={p.bin} x={x(p.bin)} y={y(p.observed)} width={x.bandwidth()} height={plot.innerHeight - y(p.observed)} fill={COPPER}>
          <title>{`Top probability ${p.bin} (n = ${p.n}): confirmed ${percentValue(p.observed)}, the tree gave ${percentValue(p.predicted)}`}</title>
        </Bar>
      ))}
      <LinePath data={points} x={centre} y={(p) => y(p.predicted)} fill="none" stroke={INK} strokeWidth={2} strokeDasharray="5 3" />
      <LeftAxis scale={y} plot={plot} format={percentTick} />
      <BottomAxis scale={x} plot={plot} />
    </ChartFrame>
  );
}
