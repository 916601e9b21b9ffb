import { DiagnosisError } from "./errors";
import { isNonNegativeNumber, requireNonNegative } from "./guards";
import { weightTable, type WeightTable } from "./weights";
import type { DxSettings } from "./types";

export interface ResolvedSettings {
  weights: WeightTable;
  history: Record<string, number>;
  priorStrength: number;
  unlistedShare: number;
  likelihoods: NonNullable<DxSettings["likelihoods"]>;
  stopThreshold: number;
  minGainBits: number;
}

export const DEFAULT_PRIOR_STRENGTH = 10;
export const DEFAULT_UNLISTED_SHARE = 0.05;
export const DEFAULT_STOP_THRESHOLD = 0.8;
export const DEFAULT_MIN_GAIN_BITS = 0.05;

export function resolveSettings(settings: DxSettings = {}): ResolvedSettings {
  const unlistedShare = settings.unlistedShare ?? DEFAULT_UNLISTED_SHARE;
  if (!isNonNegativeNumber(unlistedShare) || unlistedShare >= 1) {
    throw new DiagnosisError("bad_setting", `settings.unlistedShare must be in [0, 1), got ${String(unlistedShare)}`);
  }
  const stopThreshold = settings.stopThreshold ?? DEFAULT_STOP_THRESHOLD;
  if (!isNonNegativeNumber(stopThreshold) || stopThreshold === 0 || stopThreshold > 1) {
    throw new DiagnosisError("bad_setting", `settings.stopThreshold must be in (0, 1], got ${String(stopThreshold)}`);
  }
  const history = settings.history ?? {};
  for (const [causeId, count] of Object.entries(history)) {
    requireNonNegative(count, `settings.history[${JSON.stringify(causeId)}]`, "bad_setting");
  }
  return {
    weights: weightTable(settings.weights),
    history,
    priorStrength: requireNonNegative(settings.priorStrength ?? DEFAULT_PRIOR_STRENGTH, "settings.priorStrength", "bad_setting"),
    unlistedShare,
    likelihoods: settings.likelihoods ?? {},
    stopThreshold,
    minGainBits: requireNonNegative(settings.minGainBits ?? DEFAULT_MIN_GAIN_BITS, "settings.minGainBits", "bad_setting"),
  };
}
