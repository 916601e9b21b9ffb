import type { AssemblyCaution, FindingResult } from "@/db/schema";
import type { CompanionFigures } from "@/lib/diagnosis";

export interface StageInfo {
  slug: string;
  name: string;
  parent: string | null;
  openMinutes: number;
  closeMinutes: number;
  caution: AssemblyCaution;
}

export interface BenchCause {
  id: number;
  slug: string;
  name: string;
  /** Where it is inspected in this family's unit, and for how long once that stage is open. */
  stage: string;
  inspectMinutes: number;
  /** The catalogue's stand-alone inspection minutes, which the phone's bench plan ranks by. */
  catalogueMinutes: number;
  /** Typical repair minutes, for the labour estimate of a confirmed cause. */
  labourMinutes: number;
  /** Probability at the end of triage (0 when the ranking did not list it). */
  prior: number;
  parts: { id: number; quantity: number }[];
}

export interface RecordedFinding {
  cause: string;
  result: FindingResult;
  photoId: string | null;
}

export interface BenchInputs {
  stages: StageInfo[];
  causes: BenchCause[];
  /** Share of "none of the listed causes" at the end of triage. */
  unlisted: number;
  findings: RecordedFinding[];
  /** Confirmed cause slugs of each closed case of the family. */
  history: string[][];
}

export interface ChecklistStep {
  cause: string;
  name: string;
  stage: string;
  opens: StageInfo[];
  minutes: number;
  reachProbability: number;
}

export interface RankedCause {
  slug: string;
  name: string;
  probability: number;
  result: FindingResult | null;
}

export interface CompanionSuggestion {
  cause: string;
  name: string;
  stage: string;
  inspectMinutes: number;
  givenName: string;
  figures: CompanionFigures;
}

export interface BenchProgress {
  ranking: RankedCause[];
  unlisted: number;
  checklist: ChecklistStep[];
  expectedMinutesLeft: number;
  openStages: string[];
  found: string[];
  companions: CompanionSuggestion[];
  /** Opening and closing of every stage opened so far plus the inspections done. */
  teardownMinutes: number;
  /** teardownMinutes plus the typical repair minutes of the causes found. */
  labourEstimate: number;
  proposedParts: { id: number; quantity: number }[];
}
