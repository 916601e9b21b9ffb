/** What the practice page receives: a closed case without its caller and without its bench result. */
export interface PracticeStep {
  seq: number;
  kind: "question" | "check";
  title: string;
  prompt: string;
  answer: string;
  dontKnow: boolean;
  /** Safety texts of caution nodes the walk passes after this answer. */
  cautions: string[];
}

export interface RankedCauseView {
  slug: string;
  name: string;
  probability: number;
  /** The answer that ruled it out, as the trainee saw it, or null. */
  ruledOutBy: string | null;
}

export interface RankingView {
  causes: RankedCauseView[];
  unlisted: number;
}

export interface PracticeReplay {
  caseId: number;
  family: string;
  symptom: string;
  treeTitle: string;
  ridingUse: string;
  callerKind: string;
  steps: PracticeStep[];
  /**
   * rankings[i] is the ranking shown after the first i answers, as the case's steps stored it;
   * rankings[0], before any answer, is worked out with the shop's settings and the family's
   * history as it stood when the case was started.
   */
  rankings: RankingView[];
  /** The causes the tree version knows: what the trainee may commit to. */
  choices: { slug: string; name: string }[];
  /** Cautions shown before the first question. */
  openingCautions: string[];
}

export interface BenchResult {
  hit: boolean;
  committed: { slug: string; name: string };
  confirmed: { slug: string; name: string; primary: boolean }[];
  otherCause: string;
  parts: { name: string; quantity: number }[];
  upgrades: string;
  labourMinutes: number;
  notes: string;
  /** Where the engine ranked the first confirmed cause at the end of triage (1 = top), null if not in the tree. */
  engineRank: number | null;
}
