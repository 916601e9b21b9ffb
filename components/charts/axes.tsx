import { AxisBottom, AxisLeft, AxisRight } from "@visx/axis";
import type { AxisScale, TickFormatter, TickRendererProps } from "@visx/axis";
import { GridRows } from "@visx/grid";
import type { ScaleInput } from "@visx/scale";
import { GRID, INK, INK_FAINT } from "./colors";
import type { Plot } from "./frame";

const FONT_SIZE = 11;
// visx places a label's baseline on the tick's end (under it for the bottom axis, which adds the
// font size); the labels sit a quarter em lower, and a "middle" label another 0.355 em, centring it
// on its tick as the cap height's half.
const BASELINE_SHIFT = 0.25 * FONT_SIZE;

interface TickStyle {
  fill: string;
  anchor: "start" | "middle" | "end";
  dx?: number;
  middle?: boolean;
  angle?: number;
}

/**
 * A tick label as one plain SVG text. visx's own label (its Text component) wraps each one in an
 * svg and a tspan and works its offsets out through a CSS calc() parser on every render: three
 * elements instead of one, and several milliseconds of server time on each reports page.
 */
function tickLabel({ fill, anchor, dx = 0, middle, angle }: TickStyle) {
  function TickLabel({ x, y, formattedValue }: TickRendererProps) {
    const at = { x: x + dx, y: y + BASELINE_SHIFT };
    return (
      <text x={at.x} y={at.y} dy={middle ? "0.355em" : undefined} fill={fill} fontSize={FONT_SIZE} textAnchor={anchor}
        transform={angle ? `rotate(${angle}, ${at.x}, ${at.y})` : undefined}>
        {formattedValue}
      </text>
    );
  }
  return TickLabel;
}

// Only the font size reaches visx: it moves the bottom axis' labels below their ticks by it.
const TICK_TEXT = { fontSize: FONT_SIZE } as const;
const BOTTOM = tickLabel({ fill: INK, anchor: "middle" });
const LEFT = tickLabel({ fill: INK_FAINT, anchor: "end", dx: -2, middle: true });
const RIGHT = tickLabel({ fill: INK_FAINT, anchor: "start", dx: 2, middle: true });

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
      tickLabelProps={TICK_TEXT} tickComponent={angle ? tickLabel({ fill: INK, anchor: "end", dx: -2, middle: true, angle }) : BOTTOM} />
  );
}

export function LeftAxis<S extends AxisScale>({ scale, format, ticks, numTicks = 5 }: AxisProps<S>) {
  return (
    <AxisLeft scale={scale} tickFormat={format} tickValues={ticks} numTicks={numTicks} hideAxisLine tickStroke={INK_FAINT} tickLength={4}
      tickLabelProps={TICK_TEXT} tickComponent={LEFT} />
  );
}

export function RightAxis<S extends AxisScale>({ scale, plot, format, ticks, numTicks = 5 }: AxisProps<S>) {
  return (
    <AxisRight scale={scale} left={plot.innerWidth} tickFormat={format} tickValues={ticks} numTicks={numTicks} hideAxisLine tickStroke={INK_FAINT} tickLength={4}
      tickLabelProps={TICK_TEXT} tickComponent={RIGHT} />
  );
}

/** Horizontal guide lines at the value axis' ticks. */
export function Gridlines<S extends AxisScale>({ scale, plot, numTicks = 5, ticks }: Omit<AxisProps<S>, "format">) {
  return <GridRows scale={scale} width={plot.innerWidth} numTicks={numTicks} tickValues={ticks} stroke={GRID} />;
}
