// Series colours from Rootbench's palette (tailwind.config.ts), in the order charts use them.
export const SERIES_COLOURS = ["#b4532a", "#3f7d4e", "#4a5463", "#a86f08", "#1c2430", "#8a93a0", "#b3261e"] as const;
export const INK = "#1c2430";
export const INK_FAINT = "#8a93a0";
export const GRID = "#ece8df";
export const COPPER = "#b4532a";
export const MOSS = "#3f7d4e";

export const seriesColour = (i: number) => SERIES_COLOURS[i % SERIES_COLOURS.length];
