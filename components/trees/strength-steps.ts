import type { StrengthName } from "@/db/schema";
import { STRENGTH_LABELS } from "@/lib/trees/kinds";

/** Our own marks for the five evidence strengths: a symbol each, its word, and its colours when picked. */
export const STRENGTH_STEPS: Record<StrengthName, { symbol: string; word: string; on: string }> = {
  rules_out: { symbol: "✕", word: STRENGTH_LABELS.rules_out, on: "bg-danger text-white border-danger" },
  against: { symbol: "−", word: STRENGTH_LABELS.against, on: "bg-danger-light text-danger border-danger/60" },
  neutral: { symbol: "○", word: STRENGTH_LABELS.neutral, on: "bg-paper-deep text-ink border-ink-faint" },
  for: { symbol: "+", word: STRENGTH_LABELS.for, on: "bg-moss-light text-moss border-moss/60" },
  strong: { symbol: "++", word: STRENGTH_LABELS.strong, on: "bg-moss text-white border-moss" },
};
