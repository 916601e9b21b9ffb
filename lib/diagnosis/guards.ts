import { DiagnosisError, type DiagnosisErrorCode } from "./errors";

export function isNonNegativeNumber(x: unknown): x is number {
  return typeof x === "number" && Number.isFinite(x) && x >= 0;
}

export function requireNonNegative(x: unknown, what: string, code: DiagnosisErrorCode = "bad_number"): number {
  if (!isNonNegativeNumber(x)) {
    throw new DiagnosisError(code, `${what} must be a finite number ≥ 0, got ${String(x)}`);
  }
  return x;
}

export function requirePositive(x: unknown, what: string, code: DiagnosisErrorCode = "bad_number"): number {
  if (!isNonNegativeNumber(x) || x === 0) {
    throw new DiagnosisError(code, `${what} must be a finite number > 0, got ${String(x)}`);
  }
  return x;
}

export function requireProbability(x: unknown, what: string, code: DiagnosisErrorCode = "bad_probability"): number {
  if (!isNonNegativeNumber(x) || x > 1) {
    throw new DiagnosisError(code, `${what} must be a probability in [0, 1], got ${String(x)}`);
  }
  return x;
}
