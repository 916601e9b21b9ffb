// Series colours from Rootbench's palette (the CSS variables of app/globals.css, so they follow the
// chosen theme), in the order charts use them.
const palette = (name: string) => `var(--color-${name})`;
export const SERIES_COLOURS = ["copper", "moss", "ink-soft", "amber", "ink", "ink-faint", "danger"].map(palette);
export const INK = palette("ink");
export const INK_FAINT = palette("ink-faint");
export const GRID = palette("paper-deep");
export const COPPER = palette("copper");
export const MOSS = palette("moss");

export const seriesColour = (i: number) => SERIES_COLOURS[i % SERIES_COLOURS.length];
