import { pct } from "@/lib/format";

/** A value on a chart's 0–100 percent scale, written with the shared formatter ("12.5 %"). */
export const percentValue = (v: number, digits = 1) => pct(v / 100, digits);

/** A percent-scale axis tick ("20 %"); visx hands ticks over as its scale's input type. */
export const percentTick = (v: unknown) => percentValue(Number(v), 0);

/** At most `most` of the labels, evenly spaced and always including the first, so month labels never overlap. */
export function spacedLabels<T>(labels: T[], most: number): T[] {
  const step = Math.max(1, Math.ceil(labels.length / Math.max(1, most)));
  return labels.filter((_, i) => i % step === 0);
}

/** Whole-number tick values from 0 to `max` (counts never get a tick at 2.5), about `count` of them. */
export function wholeTicks(max: number, count = 5): number[] {
  const top = Math.max(1, Math.ceil(max));
  const step = Math.max(1, Math.ceil(top / count));
  const ticks: number[] = [];
  for (let v = 0; v <= top; v += step) ticks.push(v);
  if (ticks.at(-1)! < top) ticks.push(ticks.at(-1)! + step);
  return ticks;
}
