// Small tree builders for the engine's tests. All names are invented.
import type { DxCause, DxNode, DxOption, DxTree, Weight } from "@/lib/diagnosis";

export interface OptionSpec {
  id: string;
  to?: string | null;
  dontKnow?: boolean;
  evidence?: Record<string, Weight>;
}

export type NodeSpec = DxNode & { options?: OptionSpec[] };

export function buildTree(spec: { rootId?: string; causes: Record<string, number> | DxCause[]; nodes: NodeSpec[] }): DxTree {
  const causes = Array.isArray(spec.causes)
    ? spec.causes
    : Object.entries(spec.causes).map(([id, priorWeight]) => ({ id, priorWeight }));
  const nodes: DxNode[] = spec.nodes.map((n) => ({ id: n.id, kind: n.kind, ...(n.causeId !== undefined ? { causeId: n.causeId } : {}), ...(n.costMinutes !== undefined ? { costMinutes: n.costMinutes } : {}) }));
  const options: DxOption[] = spec.nodes.flatMap((node) =>
    (node.options ?? []).map((o) => ({
      id: o.id,
      nodeId: node.id,
      to: o.to ?? null,
      label: o.id,
      dontKnow: o.dontKnow,
      evidence: o.evidence ?? {},
    })),
  );
  return { rootId: spec.rootId ?? spec.nodes[0]?.id ?? "", nodes, options, causes };
}

export function question(id: string, options: OptionSpec[], extra: Partial<DxNode> = {}): NodeSpec {
  return { id, kind: "question", ...extra, options };
}

export function causeNode(id: string, causeId: string): NodeSpec {
  return { id, kind: "cause", causeId };
}

export function answer(nodeId: string, optionId: string) {
  return { nodeId, optionId };
}

/** A small valid tree: a question, a check on one branch, cause leaves and a caution. */
export function workshopTree(): DxTree {
  return buildTree({
    causes: { "clutch-worn": 3, "bearing-wet": 2, "sensor-drift": 1 },
    nodes: [
      question("noise", [
        { id: "noise-click", to: "load", evidence: { "clutch-worn": "strong", "bearing-wet": "against" } },
        { id: "noise-grind", to: "wet", evidence: { "bearing-wet": "strong", "clutch-worn": "against" } },
        { id: "noise-none", to: "sensor", evidence: { "sensor-drift": "for", "clutch-worn": "rules_out" } },
        { id: "noise-unsure", to: "load", dontKnow: true },
      ]),
      question("load", [
        { id: "load-yes", to: "stop-riding", evidence: { "clutch-worn": "for" } },
        { id: "load-no", to: "c-sensor", evidence: { "clutch-worn": "against", "sensor-drift": "for" } },
      ]),
      question("wet", [
        { id: "wet-yes", to: "c-bearing", evidence: { "bearing-wet": "strong" } },
        { id: "wet-no", to: "c-clutch", evidence: { "bearing-wet": "against" } },
      ]),
      {
        id: "sensor",
        kind: "check",
        costMinutes: 10,
        options: [
          { id: "sensor-off", to: "c-sensor", evidence: { "sensor-drift": "strong" } },
          { id: "sensor-ok", to: "c-clutch", evidence: { "sensor-drift": "rules_out" } },
        ],
      },
      { id: "stop-riding", kind: "caution", options: [{ id: "stop-riding-next", to: "c-clutch" }] },
      causeNode("c-clutch", "clutch-worn"),
      causeNode("c-bearing", "bearing-wet"),
      causeNode("c-sensor", "sensor-drift"),
    ],
  });
}
