import { z } from "zod";
import type { DxSettings } from "@/lib/diagnosis";

/**
 * The shop's diagnosis settings (settings table, key "diagnosis"); anything missing or invalid
 * falls back to the engine's defaults (strength weights 0, 1/3, 1, 3, 9; α 10; unlisted 0.05;
 * stop at 0.8; minimum gain 0.05 bits).
 */
export const DIAGNOSIS_SETTINGS_KEY = "diagnosis";

const share = z.number().min(0).lt(1);
export const diagnosisSettingsSchema = z.object({
  weights: z.object({
    rules_out: z.number().min(0), against: z.number().min(0), neutral: z.number().min(0), for: z.number().min(0), strong: z.number().min(0),
  }).partial().optional(),
  priorStrength: z.number().min(0).optional(),
  unlistedShare: share.optional(),
  stopThreshold: z.number().gt(0).max(1).optional(),
  minGainBits: z.number().min(0).optional(),
});
export type DiagnosisSettings = z.infer<typeof diagnosisSettingsSchema>;

export function parseDiagnosisSettings(value: unknown): DiagnosisSettings {
  const parsed = diagnosisSettingsSchema.safeParse(value ?? {});
  return parsed.success ? parsed.data : {};
}

/** Engine settings for one case: the shop's settings plus its confirmed history for the motor family. */
export function dxSettingsFor(stored: unknown, history: Record<string, number>): DxSettings {
  const s = parseDiagnosisSettings(stored);
  return {
    ...(s.weights ? { weights: s.weights } : {}),
    ...(s.priorStrength !== undefined ? { priorStrength: s.priorStrength } : {}),
    ...(s.unlistedShare !== undefined ? { unlistedShare: s.unlistedShare } : {}),
    ...(s.stopThreshold !== undefined ? { stopThreshold: s.stopThreshold } : {}),
    ...(s.minGainBits !== undefined ? { minGainBits: s.minGainBits } : {}),
    history,
  };
}
