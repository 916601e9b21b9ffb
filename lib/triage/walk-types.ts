import type { CauseArea } from "@/db/schema";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import type { ViewNode, ViewOption } from "@/lib/triage/walk-view";
import type { DxTree } from "@/lib/diagnosis";

export interface WalkCause {
  slug: string;
  name: string;
  area: CauseArea;
  priceLowCents: number;
  priceHighCents: number;
  labourMinutes: number;
  inspectMinutes: number;
}

export interface WalkCase {
  id: number;
  reference: string;
  callerName: string;
  callerKind: string;
  phone: string;
  email: string;
  familyLabel: string;
  serial: string;
  ridingUse: string;
  symptom: string;
  treeTitle: string;
  treeVersionNumber: number;
  notes: string;
}

export interface WalkTree {
  dx: DxTree;
  nodes: ViewNode[];
  options: ViewOption[];
}

export interface WalkStep {
  /** Database id of the stored step. */
  id: number;
  seq: number;
  nodeKey: string;
  optionKey: string;
  ranking: StoredRanking;
}

export interface WalkProps {
  kase: WalkCase;
  tree: WalkTree;
  causes: WalkCause[];
  steps: WalkStep[];
  startRanking: StoredRanking;
}
