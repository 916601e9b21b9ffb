import { curveMonotoneX } from "@visx/curve";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar, LinePath } from "@visx/shape";
import { BottomAxis, Gridlines, LeftAxis, RightAxis } from "@/components/charts/axes";
import { COPPER, INK } from "@/components/charts/colors";
import { ChartFrame, plotArea } from "@/components/charts/frame";
import { percentTick, percentValue } from "@/components/charts/ticks";

export interface ParetoPoint {
  rank: number;
  name: string;
  n: number;
  share: number;
  /** Wilson 95 % interval as distances below and above the share, in percent. */
  error: [number, number];
  cumulative: number;
}

/** The 95 % interval as one path: the upright from `low` to `high` and a 4-unit cap at each end. */
const whisker = (x: number, low: number, high: number) => `M${x},${low}V${high}M${x - 2},${high}H${x + 2}M${x - 2},${low}H${x + 2}`;
const short = (s: string) => (s.length > 22 ? `${s.slice(0, 21)}…` : s);

/** Share of closed cases per cause with its interval (bars, left axis), and the cumulative share (line, right axis). */
export function ParetoChart({ points }: { points: ParetoPoint[] }) {
  const plot = plotArea(760, 380, { top: 12, right: 52, bottom: 120, left: 100 });
  const x = scaleBand({ domain: points.map((p) => p.rank), range: [0, plot.innerWidth], padding: 0.2, round: true });
  const share = scaleLinear({ domain: [0, Math.max(1, ...points.map((p) => p.share + p.error[1]))], range: [plot.innerHeight, 0], nice: true, round: true });
  const cumulative = scaleLinear({ domain: [0, 100], range: [plot.innerHeight, 0], round: true });
  const centre = (p: ParetoPoint) => (x(p.rank) ?? 0) + x.bandwidth() / 2;
  const nameOf = new Map(points.map((p) => [p.rank, p.name]));
  return (
    <ChartFrame plot={plot} label="Pareto chart of confirmed causes; the table lists the same numbers"
      legend={[{ name: "Share of cases", colour: COPPER, mark: "bar" }, { name: "Cumulative share", colour: INK, mark: "line" }]}>
      <Gridlines scale={share} plot={plot} />
      {points.map((p) => (
        <g key={p.rank}>
          <title>{`${p.name}: ${percentValue(p.share)} of cases (n = ${p.n}), 95 % interval ${percentValue(p.share - p.error[0])}–${percentValue(p.share + p.error[1])}; cumulative ${percentValue(p.cumulative)}`}</title>
          <Bar x={x(p.rank)} y={share(p.share)} width={x.bandwidth()} height={plot.innerHeight - share(p.share)} fill={COPPER} />
          <path className="whisker" d={whisker(centre(p), share(p.share - p.error[0]), share(p.share + p.error[1]))} fill="none" stroke={INK} shapeRendering="crispEdges" />
        </g>
      ))}
      <LinePath data={points} x={centre} y={(p) => cumulative(p.cumulative)} curve={curveMonotoneX} fill="none" stroke={INK} strokeWidth={2} />
      {points.map((p) => <circle key={p.rank} cx={centre(p)} cy={cumulative(p.cumulative)} r={2} fill={INK} />)}
      <LeftAxis scale={share} plot={plot} format={percentTick} />
      <RightAxis scale={cumulative} plot={plot} format={percentTick} />
      <BottomAxis scale={x} plot={plot} angle={-35} format={(rank) => short(nameOf.get(rank) ?? "")} />
    </ChartFrame>
  );
}
