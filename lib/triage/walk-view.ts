import type { GraphNode, GraphOption } from "@/lib/trees/graph-types";
import type { ReachedCaution } from "./safety";

/** The parts of a tree graph the triage screen needs (a GraphNode / GraphOption fits). */
export type ViewNode = Omit<GraphNode, "posX" | "posY">;
export type ViewOption = Pick<GraphOption, "id" | "key" | "fromKey" | "toKey" | "label" | "dontKnow">;

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
