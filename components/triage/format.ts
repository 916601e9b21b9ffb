export const percent = (p: number) => (p > 0 && p < 0.005 ? "<1\u00a0%" : `${Math.round(p * 100)}\u00a0%`);
export const bits = (b: number) => `${b.toFixed(2)} bits`;
