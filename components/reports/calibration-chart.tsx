"use client";
import { Bar, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { COPPER, GRID, INK, INK_FAINT } from "./chart-colors";

export interface CalibrationPoint {
  bin: string;
  n: number;
  predicted: number;
  observed: number;
}

/** Per bin of the top probability: how often the top cause was confirmed (bars) against what the tree said (line). */
export function CalibrationChart({ points }: { points: CalibrationPoint[] }) {
  return (
    <div role="img" aria-label="Calibration of the top-ranked cause; the table lists the same numbers" className="h-72 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={points} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={GRID} vertical={false} />
          <XAxis dataKey="bin" tick={{ fontSize: 11, fill: INK }} />
          <YAxis unit=" %" domain={[0, 100]} tick={{ fontSize: 11, fill: INK_FAINT }} width={48} />
          <Tooltip formatter={(value) => `${Number(value).toFixed(1)} %`} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar dataKey="observed" name="Top cause confirmed" fill={COPPER} isAnimationActive={false} />
          <Line dataKey="predicted" name="Probability the tree gave it" stroke={INK} strokeWidth={2} strokeDasharray="5 3" isAnimationActive={false} />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
