import type { OutcomeDraft } from "@/components/outcomes/types";
import type { BenchCause, BenchProgress } from "./types";

interface SavedOutcome {
  outcome: { otherCause: string; upgrades: string; labourMinutes: number; notes: string } | null;
  causes: { id: number; primary: boolean }[];
  parts: { id: number; quantity: number }[];
  upgradeKinds: string[];
}

/**
 * The outcome form's starting values at the end of the teardown: what was saved already, or else
 * the causes found (the most probable one primary), their parts and the labour estimate.
 */
export function outcomeDraftFor(saved: SavedOutcome | null, progress: BenchProgress, causes: BenchCause[]): OutcomeDraft {
  if (saved?.outcome) {
    return { ...saved.outcome, causes: saved.causes, parts: saved.parts, upgradeKinds: saved.upgradeKinds };
  }
  const idOf = new Map(causes.map((c) => [c.slug, c.id]));
  const found = progress.ranking.filter((r) => r.result === "found");
  return {
    causes: found.flatMap((r, i) => (idOf.has(r.slug) ? [{ id: idOf.get(r.slug)!, primary: i === 0 }] : [])),
    otherCause: "",
    parts: progress.proposedParts,
    upgrades: "",
    upgradeKinds: [],
    labourMinutes: progress.labourEstimate,
    notes: "",
  };
}
