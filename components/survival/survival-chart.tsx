import { curveStepAfter } from "@visx/curve";
import { scaleLinear } from "@visx/scale";
import { Area, LinePath } from "@visx/shape";
import { BottomAxis, Gridlines, LeftAxis } from "@/components/charts/axes";
import { COPPER, MOSS } from "@/components/charts/colors";
import { ChartFrame, plotArea } from "@/components/charts/frame";
import { percent } from "@/lib/format";

export interface CurvePoint {
  /** Months since the repair was closed. */
  t: number;
  s: number;
  band: [number, number];
}

export interface Curve {
  key: string;
  name: string;
  points: CurvePoint[];
}

const COLOURS = [MOSS, COPPER];
const MONTH_TICKS = [0, 3, 6, 9, 12, 18, 24, 30, 36];

/**
 * Return-free survival as step lines with their 95 % bands. The numbers (at 3, 6 and 12 months, and
 * at risk) are in the tables beside it, so the steps carry no hover text of their own: a curve has
 * hundreds of them and each would be sent with the page.
 */
export function SurvivalChart({ curves, months, label }: { curves: Curve[]; months: number; label: string }) {
  const plot = plotArea(560, 260, { top: 12, right: 16, bottom: 28, left: 48 });
  const x = scaleLinear({ domain: [0, months], range: [0, plot.innerWidth], round: true });
  const y = scaleLinear({ domain: [0, 1], range: [plot.innerHeight, 0], round: true });
  const colour = (i: number) => COLOURS[i % COLOURS.length];
  return (
    <ChartFrame plot={plot} label={label}
      legend={curves.map((c, i) => ({ name: c.name, colour: colour(i), mark: "line" as const }))}>
      <Gridlines scale={y} plot={plot} />
      {curves.map((c, i) => (
        <Area key={`${c.key}-band`} data={c.points} x={(p) => x(p.t)} y0={(p) => y(p.band[0])} y1={(p) => y(p.band[1])}
          curve={curveStepAfter} fill={colour(i)} fillOpacity={0.15} />
      ))}
      {curves.map((c, i) => (
        <g key={c.key}>
          <title>{c.name}</title>
          <LinePath data={c.points} x={(p) => x(p.t)} y={(p) => y(p.s)} curve={curveStepAfter} fill="none" stroke={colour(i)} strokeWidth={2} />
        </g>
      ))}
      <LeftAxis scale={y} plot={plot} format={(v) => percent(Number(v))} />
      <BottomAxis scale={x} plot={plot} ticks={MONTH_TICKS.filter((m) => m <= months)} format={(v) => `${v} mo`} />
    </ChartFrame>
  );
}
