import type { StrengthName } from "@/db/schema";
import type { DraftGraph, DraftNode, DraftOption } from "./draft";

/** What changed between two versions of a tree, for people to read. Positions are counted, not listed. */
export interface FieldChange {
  field: string;
  before: string;
  after: string;
}

export interface NodeRef {
  key: string;
  kind: DraftNode["kind"];
  title: string;
}

export interface OptionRef {
  key: string;
  fromKey: string;
  label: string;
}

export interface EvidenceChange {
  optionKey: string;
  fromKey: string;
  label: string;
  cause: string;
  before: StrengthName;
  after: StrengthName;
}

export interface GraphDiff {
  rootChanged: { before: string | null; after: string | null } | null;
  causesAdded: { slug: string; priorWeight: number }[];
  causesRemoved: { slug: string; priorWeight: number }[];
  priorsChanged: { slug: string; before: number; after: number }[];
  nodesAdded: NodeRef[];
  nodesRemoved: NodeRef[];
  nodesChanged: (NodeRef & { changes: FieldChange[] })[];
  nodesMoved: number;
  optionsAdded: (OptionRef & { toKey: string | null; evidence: DraftOption["evidence"] })[];
  optionsRemoved: OptionRef[];
  optionsChanged: (OptionRef & { changes: FieldChange[] })[];
  evidenceChanged: EvidenceChange[];
}

const NODE_FIELDS: { field: keyof DraftNode; label: string }[] = [
  { field: "kind", label: "kind" },
  { field: "title", label: "title" },
  { field: "prompt", label: "wording" },
  { field: "costMinutes", label: "cost (minutes)" },
  { field: "needsOpening", label: "needs the unit opened" },
  { field: "causeSlug", label: "linked cause" },
  { field: "cautionText", label: "caution text" },
];

const show = (v: unknown): string => (v === null || v === undefined || v === "" ? "—" : typeof v === "boolean" ? (v ? "yes" : "no") : String(v));

function fieldChanges<T>(a: T, b: T, fields: { field: keyof T; label: string }[]): FieldChange[] {
  return fields.filter(({ field }) => a[field] !== b[field]).map(({ field, label }) => ({ field: label, before: show(a[field]), after: show(b[field]) }));
}

const nodeRef = (n: DraftNode): NodeRef => ({ key: n.key, kind: n.kind, title: n.title });
const optionRef = (o: DraftOption): OptionRef => ({ key: o.key, fromKey: o.fromKey, label: o.label });

/** Nodes, options and causes are matched by key and slug, the ids that stay stable across versions. */
export function diffGraphs(before: DraftGraph, after: DraftGraph): GraphDiff {
  const beforeNodes = new Map(before.nodes.map((n) => [n.key, n]));
  const afterNodes = new Map(after.nodes.map((n) => [n.key, n]));
  const beforeOptions = new Map(before.options.map((o) => [o.key, o]));
  const afterOptions = new Map(after.options.map((o) => [o.key, o]));
  const beforeCauses = new Map(before.causes.map((c) => [c.slug, c]));
  const afterCauses = new Map(after.causes.map((c) => [c.slug, c]));

  const diff: GraphDiff = {
    rootChanged: before.rootKey === after.rootKey ? null : { before: before.rootKey, after: after.rootKey },
    causesAdded: after.causes.filter((c) => !beforeCauses.has(c.slug)).map((c) => ({ slug: c.slug, priorWeight: c.priorWeight })),
    causesRemoved: before.causes.filter((c) => !afterCauses.has(c.slug)).map((c) => ({ slug: c.slug, priorWeight: c.priorWeight })),
    priorsChanged: after.causes.flatMap((c) => {
      const old = beforeCauses.get(c.slug);
      return old && old.priorWeight !== c.priorWeight ? [{ slug: c.slug, before: old.priorWeight, after: c.priorWeight }] : [];
    }),
    nodesAdded: after.nodes.filter((n) => !beforeNodes.has(n.key)).map(nodeRef),
    nodesRemoved: before.nodes.filter((n) => !afterNodes.has(n.key)).map(nodeRef),
    nodesChanged: [],
    nodesMoved: 0,
    optionsAdded: after.options
      .filter((o) => !beforeOptions.has(o.key))
      .map((o) => ({ ...optionRef(o), toKey: o.toKey, evidence: { ...o.evidence } })),
    optionsRemoved: before.options.filter((o) => !afterOptions.has(o.key)).map(optionRef),
    optionsChanged: [],
    evidenceChanged: [],
  };

  for (const node of after.nodes) {
    const old = beforeNodes.get(node.key);
    if (!old) continue;
    const changes = fieldChanges(old, node, NODE_FIELDS);
    if (changes.length) diff.nodesChanged.push({ ...nodeRef(node), changes });
    if (old.posX !== node.posX || old.posY !== node.posY) diff.nodesMoved++;
  }

  // Places count only answers present in both versions, so adding or removing one moves no other.
  const common = new Set(after.options.filter((o) => beforeOptions.has(o.key)).map((o) => o.key));
  const orderOf = (graph: DraftGraph) => {
    const order = new Map<string, number>();
    const seen = new Map<string, number>();
    for (const o of graph.options) {
      if (!common.has(o.key)) continue;
      const i = seen.get(o.fromKey) ?? 0;
      order.set(o.key, i);
      seen.set(o.fromKey, i + 1);
    }
    return order;
  };
  const beforeOrder = orderOf(before);
  const afterOrder = orderOf(after);
  const neutral = (e: DraftOption["evidence"], slug: string): StrengthName => e[slug] ?? "neutral";

  for (const option of after.options) {
    const old = beforeOptions.get(option.key);
    if (!old) continue;
    const changes = fieldChanges(
      { ...old, place: (beforeOrder.get(old.key) ?? 0) + 1 },
      { ...option, place: (afterOrder.get(option.key) ?? 0) + 1 },
      [
        { field: "label", label: "label" },
        { field: "fromKey", label: "asked at" },
        { field: "toKey", label: "leads to" },
        { field: "dontKnow", label: "don't know" },
        { field: "place", label: "place among the answers" },
      ],
    );
    if (changes.length) diff.optionsChanged.push({ ...optionRef(option), changes });
    const slugs = new Set([...Object.keys(old.evidence), ...Object.keys(option.evidence)]);
    for (const cause of [...slugs].sort()) {
      const a = neutral(old.evidence, cause);
      const b = neutral(option.evidence, cause);
      if (a !== b) diff.evidenceChanged.push({ optionKey: option.key, fromKey: option.fromKey, label: option.label, cause, before: a, after: b });
    }
  }
  return diff;
}

/** Number of listed changes (moves aside); 0 means the two versions ask and weigh the same. */
export function diffSize(diff: GraphDiff): number {
  return (diff.rootChanged ? 1 : 0) + diff.causesAdded.length + diff.causesRemoved.length + diff.priorsChanged.length +
    diff.nodesAdded.length + diff.nodesRemoved.length + diff.nodesChanged.length + diff.optionsAdded.length +
    diff.optionsRemoved.length + diff.optionsChanged.length + diff.evidenceChanged.length;
}
