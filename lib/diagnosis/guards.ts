import { DiagnosisError, type DiagnosisErrorCode } from "./errors";

export function isNonNegativeNumber(x: unknown): x is number {
  return typeof x === "number" && Number.isFinite(x) && x >= 0;
}

/** What a checked value is, for the error message; a function is called only when the check fails. */
export type Label = string | (() => string);

const labelText = (what: Label) => (typeof what === "function" ? what() : what);

export function requireNonNegative(x: unknown, what: Label, code: DiagnosisErrorCode = "bad_number"): number {
  if (!isNonNegativeNumber(x)) {
    throw new DiagnosisError(code, `${labelText(what)} must be a finite number ≥ 0, got ${String(x)}`);
  }
  return x;
}

export function requirePositive(x: unknown, what: Label, code: DiagnosisErrorCode = "bad_number"): number {
  if (!isNonNegativeNumber(x) || x === 0) {
    throw new DiagnosisError(code, `${labelText(what)} must be a finite number > 0, got ${String(x)}`);
  }
  return x;
}

export function requireProbability(x: unknown, what: Label, code: DiagnosisErrorCode = "bad_probability"): number {
  if (!isNonNegativeNumber(x) || x > 1) {
    throw new DiagnosisError(code, `${labelText(what)} must be a probability in [0, 1], got ${String(x)}`);
  }
  return x;
}
