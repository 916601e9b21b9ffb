import { AxisBottom, AxisLeft, AxisRight } from "@visx/axis";
import type { AxisScale, TickFormatter } from "@visx/axis";
import { GridRows } from "@visx/grid";
import type { ScaleInput } from "@visx/scale";
import { GRID, INK, INK_FAINT } from "./colors";
import type { Plot } from "./frame";

const TICK_TEXT = { fontSize: 11, fontFamily: "inherit" } as const;

interface AxisProps<S extends AxisScale> {
  scale: S;
  plot: Plot;
  format?: TickFormatter<ScaleInput<S>>;
  ticks?: ScaleInput<S>[];
  numTicks?: number;
}

/** Category or time labels under the plot; `angle` tilts long labels so they do not overlap. */
export function BottomAxis<S extends AxisScale>({ scale, plot, format, ticks, numTicks, angle }: AxisProps<S> & { angle?: number }) {
  return (
    <AxisBottom scale={scale} top={plot.innerHeight} tickFormat={format} tickValues={ticks} numTicks={numTicks}
      stroke={INK_FAINT} tickStroke={INK_FAINT} tickLength={4}
      tickLabelProps={angle
        ? { ...TICK_TEXT, fill: INK, angle, textAnchor: "end", verticalAnchor: "middle", dx: -2 }
        : { ...TICK_TEXT, fill: INK, textAnchor: "middle" }} />
  );
}

export function LeftAxis<S extends AxisScale>({ scale, format, ticks, numTicks = 5 }: AxisProps<S>) {
  return (
    <AxisLeft scale={scale} tickFormat={format} tickValues={ticks} numTicks={numTicks} hideAxisLine tickStroke={INK_FAINT} tickLength={4}
      tickLabelProps={{ ...TICK_TEXT, fill: INK_FAINT, textAnchor: "end", verticalAnchor: "middle", dx: -2 }} />
  );
}

export function RightAxis<S extends AxisScale>({ scale, plot, format, ticks, numTicks = 5 }: AxisProps<S>) {
  return (
    <AxisRight scale={scale} left={plot.innerWidth} tickFormat={format} tickValues={ticks} numTicks={numTicks} hideAxisLine tickStroke={INK_FAINT} tickLength={4}
      tickLabelProps={{ ...TICK_TEXT, fill: INK_FAINT, textAnchor: "start", verticalAnchor: "middle", dx: 2 }} />
  );
}

/** Horizontal guide lines at the value axis' ticks. */
export function Gridlines<S extends AxisScale>({ scale, plot, numTicks = 5, ticks }: Omit<AxisProps<S>, "format">) {
  return <GridRows scale={scale} width={plot.innerWidth} numTicks={numTicks} tickValues={ticks} stroke={GRID} />;
}
