export const percent = (p: number) => (p > 0 && p < 0.005 ? "<1 %" : `${Math.round(p * 100)} %`);
export const bits = (b: number) => `${b.toFixed(2)} bits`;
