import type { NodeKind } from "@/db/schema";
import type { ReachedCaution } from "./safety";

/** The parts of a tree graph the triage screen needs (a GraphNode / GraphOption fits). */
export interface ViewNode {
  id: number;
  key: string;
  kind: NodeKind;
  title: string;
  prompt: string;
  costMinutes: number;
  needsOpening: boolean;
  causeSlug: string | null;
  cautionText: string;
}

export interface ViewOption {
  id: number;
  key: string;
  fromKey: string;
  toKey: string | null;
  label: string;
  dontKnow: boolean;
}

/** Caution nodes the walk passed, each marked when it stands in front of a check that opens the unit. */
export function reachedCautions(
  cautionKeys: readonly string[],
  nodeByKey: ReadonlyMap<string, ViewNode>,
  options: readonly ViewOption[],
): ReachedCaution[] {
  return cautionKeys.flatMap((key) => {
    const node = nodeByKey.get(key);
    if (!node) return [];
    const next = options.find((o) => o.fromKey === key)?.toKey;
    const guardsOpening = next ? nodeByKey.get(next)?.needsOpening === true : false;
    return [{ key, title: node.title, guardsOpening }];
  });
}
