import type { ReactNode } from "react";

export interface Margin { top: number; right: number; bottom: number; left: number }

/** The drawing area inside a chart's margins, in the SVG's own units. */
export interface Plot { width: number; height: number; margin: Margin; innerWidth: number; innerHeight: number }

export function plotArea(width: number, height: number, margin: Margin): Plot {
  return { width, height, margin, innerWidth: width - margin.left - margin.right, innerHeight: height - margin.top - margin.bottom };
}

export type LegendMark = "bar" | "line" | "dashed";
export interface LegendItem { name: string; colour: string; mark: LegendMark }

const MARK_STYLE: Record<LegendMark, (colour: string) => React.CSSProperties> = {
  bar: (c) => ({ background: c, width: 10, height: 10 }),
  line: (c) => ({ borderTop: `2px solid ${c}`, width: 16 }),
  dashed: (c) => ({ borderTop: `2px dashed ${c}`, width: 16 }),
};

/**
 * A chart drawn on the server as plain SVG: it scales with its column through the viewBox, needs no
 * script in the browser, and is on screen with the first paint. Hovering a mark shows its numbers
 * (each mark carries an SVG title); the table beside every chart holds the same numbers for reading.
 */
export function ChartFrame({ plot, label, legend, children }: { plot: Plot; label: string; legend?: LegendItem[]; children: ReactNode }) {
  return (
    <figure className="mx-auto w-full" style={{ maxWidth: plot.width }} data-testid="chart">
      <svg role="img" aria-label={label} viewBox={`0 0 ${plot.width} ${plot.height}`} className="h-auto w-full">
        <g transform={`translate(${plot.margin.left},${plot.margin.top})`}>{children}</g>
      </svg>
      {legend && legend.length > 0 ? (
        <figcaption>
          <ul className="flex flex-wrap justify-center gap-x-4 gap-y-1 text-xs text-ink-soft">
            {legend.map((item) => (
              <li key={item.name} className="flex items-center gap-1.5">
                <span aria-hidden="true" className="inline-block" style={MARK_STYLE[item.mark](item.colour)} />
                {item.name}
              </li>
            ))}
          </ul>
        </figcaption>
      ) : null}
    </figure>
  );
}
