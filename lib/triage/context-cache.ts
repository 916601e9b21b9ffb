import "server-only";
import type { CaseStatus } from "@/db/schema";

/** A case as read from the database, before the engine settings are derived from it. */
export interface StoredCase {
  id: number;
  reference: string;
  status: CaseStatus;
  familyId: number;
  treeVersionId: number;
  /** Recorded steps in order, with database ids. */
  steps: { id: number; seq: number; nodeId: number; optionId: number }[];
  storedSettings: unknown;
  /** What the settings are computed from; a step is stored only while these are still current. */
  basis: { settingsHash: string | null; likelihoodMode: string };
}

const MAX_CASES = 1000;
const globalCache = globalThis as unknown as { rootbenchOpenCases?: Map<number, StoredCase> };
// Open cases only, most recently used last. Nothing here is trusted blindly: appendStep stores a
// step only if the case is still open, the step it followed is still the last one and the settings
// are unchanged, so a stale entry costs one retry from the database, never a wrong step.
const cache: Map<number, StoredCase> = (globalCache.rootbenchOpenCases ??= new Map());

export function cachedCase(caseId: number): StoredCase | null {
  const hit = cache.get(caseId);
  if (!hit) return null;
  cache.delete(caseId);
  cache.set(caseId, hit);
  return hit;
}

export function rememberCase(stored: StoredCase): void {
  cache.delete(stored.id);
  if (stored.status !== "open") return;
  cache.set(stored.id, stored);
  while (cache.size > MAX_CASES) cache.delete(cache.keys().next().value as number);
}

/** After a stored step: extends the remembered case, or forgets it if it was not the step's base. */
export function rememberAppended(caseId: number, previousId: number | null, step: StoredCase["steps"][number]): void {
  const hit = cache.get(caseId);
  if (!hit) return;
  if ((hit.steps.at(-1)?.id ?? null) !== previousId) return void cache.delete(caseId);
  cache.set(caseId, { ...hit, steps: [...hit.steps, step] });
}

/** After an undo: drops the removed step, or forgets the case if memory did not end with it. */
export function rememberUndone(caseId: number, removedId: number): void {
  const hit = cache.get(caseId);
  if (!hit) return;
  if (hit.steps.at(-1)?.id !== removedId) return void cache.delete(caseId);
  cache.set(caseId, { ...hit, steps: hit.steps.slice(0, -1) });
}

export function forgetCase(caseId: number): void {
  cache.delete(caseId);
}
