"use client";
import { Area, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { COPPER, GRID, INK, INK_FAINT, MOSS } from "@/components/reports/chart-colors";
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

/** Return-free survival as step lines with their 95 % bands; the tables beside it hold the same numbers. */
export function SurvivalChart({ curves, months, label }: { curves: Curve[]; months: number; label: string }) {
  return (
    <div role="img" aria-label={label} className="h-64 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={GRID} />
          <XAxis type="number" dataKey="t" domain={[0, months]} ticks={[0, 3, 6, 9, 12, 18, 24, 30, 36].filter((m) => m <= months)}
            tick={{ fontSize: 11, fill: INK }} unit=" mo" allowDuplicatedCategory={false} />
          <YAxis domain={[0, 1]} tickFormatter={percent} tick={{ fontSize: 11, fill: INK_FAINT }} width={52} />
          <Tooltip formatter={(v) => (Array.isArray(v) ? v.map((x) => percent(Number(x))).join("–") : percent(Number(v)))}
            labelFormatter={(t) => `${Number(t).toFixed(1)} months`} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          {curves.map((c, i) => (
            <Area key={`${c.key}-band`} data={c.points} dataKey="band" name={`${c.name}, 95 % band`} type="stepAfter"
              stroke="none" fill={COLOURS[i % 2]} fillOpacity={0.15} isAnimationActive={false} legendType="none" />
          ))}
          {curves.map((c, i) => (
            <Line key={c.key} data={c.points} dataKey="s" name={c.name} type="stepAfter" stroke={COLOURS[i % 2]}
              strokeWidth={2} dot={false} isAnimationActive={false} />
          ))}
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
