"use client";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { GRID, INK, INK_FAINT, seriesColour } from "./chart-colors";

export function TrendChart({ months, series }: {
  months: ({ label: string } & Record<string, number | string>)[];
  series: { key: string; name: string }[];
}) {
  return (
    <div role="img" aria-label="Closed cases per month by cause; the table lists the same numbers" className="h-80 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={months} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={GRID} vertical={false} />
          <XAxis dataKey="label" tick={{ fontSize: 11, fill: INK }} />
          <YAxis allowDecimals={false} tick={{ fontSize: 11, fill: INK_FAINT }} width={40} />
          <Tooltip />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          {series.map((s, i) => (
            <Line key={s.key} dataKey={s.key} name={s.name} stroke={seriesColour(i)} strokeWidth={2} dot={false} isAnimationActive={false} type="linear" />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
