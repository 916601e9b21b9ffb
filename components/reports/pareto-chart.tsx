"use client";
import { Bar, CartesianGrid, ComposedChart, ErrorBar, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { COPPER, GRID, INK, INK_FAINT } from "./chart-colors";

export interface ParetoPoint {
  rank: number;
  name: string;
  n: number;
  share: number;
  /** Wilson 95 % interval as distances below and above the share, in percent. */
  error: [number, number];
  cumulative: number;
}

const short = (s: string) => (s.length > 22 ? `${s.slice(0, 21)}…` : s);

/** Share of closed cases per cause with its interval (bars, left axis), and the cumulative share (line, right axis). */
export function ParetoChart({ points }: { points: ParetoPoint[] }) {
  return (
    <div role="img" aria-label="Pareto chart of confirmed causes; the table lists the same numbers" className="h-80 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={points} margin={{ top: 8, right: 8, bottom: 8, left: 36 }}>
          <CartesianGrid stroke={GRID} vertical={false} />
          <XAxis dataKey="name" tickFormatter={short} angle={-35} textAnchor="end" height={110} interval={0} tick={{ fontSize: 11, fill: INK }} />
          <YAxis yAxisId="share" unit=" %" domain={[0, "auto"]} tick={{ fontSize: 11, fill: INK_FAINT }} width={48} />
          <YAxis yAxisId="cumulative" orientation="right" unit=" %" domain={[0, 100]} tick={{ fontSize: 11, fill: INK_FAINT }} width={48} />
          <Tooltip
            formatter={(value, name) => [`${Number(value).toFixed(1)} %`, name === "share" ? "Share of cases" : "Cumulative share"]}
            labelFormatter={(label) => String(label)}
          />
          <Bar yAxisId="share" dataKey="share" name="share" fill={COPPER} isAnimationActive={false}>
            <ErrorBar dataKey="error" width={4} stroke={INK} strokeWidth={1} direction="y" />
          </Bar>
          <Line yAxisId="cumulative" dataKey="cumulative" name="cumulative" stroke={INK} strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} type="monotone" />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
