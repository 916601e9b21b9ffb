"use client";
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { GRID, INK, INK_FAINT, seriesColour } from "./chart-colors";

export function PartsChart({ months, parts }: {
  months: ({ label: string } & Record<string, number | string>)[];
  parts: { slug: string; name: string }[];
}) {
  return (
    <div role="img" aria-label="Parts replaced per month; the table lists the same numbers" className="h-72 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={months} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={GRID} vertical={false} />
          <XAxis dataKey="label" tick={{ fontSize: 11, fill: INK }} />
          <YAxis allowDecimals={false} tick={{ fontSize: 11, fill: INK_FAINT }} width={40} />
          <Tooltip />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          {parts.map((p, i) => <Bar key={p.slug} dataKey={p.slug} name={p.name} stackId="parts" fill={seriesColour(i)} isAnimationActive={false} />)}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
