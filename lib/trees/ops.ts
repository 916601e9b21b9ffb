import type { NodeKind, StrengthName } from "@/db/schema";
import type { DraftGraph, DraftNode, DraftOption } from "./draft";
import { asksSomething } from "./kinds";

/** Pure edits of a draft graph. Each returns a new draft and keeps unchanged nodes and options as they were. */

const KEY_PREFIX: Record<NodeKind, string> = { question: "q", check: "check", cause: "cause", caution: "caution" };

function freeKey(prefix: string, taken: ReadonlySet<string>): string {
  for (let n = 1; ; n++) {
    const key = `${prefix}-${n}`;
    if (!taken.has(key)) return key;
  }
}

export function newNodeKey(draft: DraftGraph, kind: NodeKind): string {
  return freeKey(KEY_PREFIX[kind], new Set(draft.nodes.map((n) => n.key)));
}

export function newOptionKey(draft: DraftGraph, fromKey: string): string {
  return freeKey(`${fromKey}-a`, new Set(draft.options.map((o) => o.key)));
}

const NEW_TITLES: Record<NodeKind, string> = {
  question: "New question",
  check: "New check",
  cause: "New cause",
  caution: "New caution",
};

export function addNode(draft: DraftGraph, kind: NodeKind, position: { x: number; y: number }): { draft: DraftGraph; key: string } {
  const key = newNodeKey(draft, kind);
  const node: DraftNode = {
    key, kind, title: NEW_TITLES[kind], prompt: "", costMinutes: kind === "check" ? 5 : 1, needsOpening: false,
    causeSlug: null, cautionText: "", posX: Math.round(position.x), posY: Math.round(position.y),
  };
  return { draft: { ...draft, nodes: [...draft.nodes, node], rootKey: draft.rootKey ?? key }, key };
}

/** Removes nodes with the answers leaving them; answers that led to them now lead nowhere. */
export function removeNodes(draft: DraftGraph, keys: readonly string[]): DraftGraph {
  if (keys.length === 0) return draft;
  const gone = new Set(keys);
  return {
    ...draft,
    rootKey: draft.rootKey && gone.has(draft.rootKey) ? null : draft.rootKey,
    nodes: draft.nodes.filter((n) => !gone.has(n.key)),
    options: draft.options
      .filter((o) => !gone.has(o.fromKey))
      .map((o) => (o.toKey && gone.has(o.toKey) ? { ...o, toKey: null } : o)),
  };
}

export function removeOptions(draft: DraftGraph, keys: readonly string[]): DraftGraph {
  if (keys.length === 0) return draft;
  const gone = new Set(keys);
  return { ...draft, options: draft.options.filter((o) => !gone.has(o.key)) };
}

export function updateNode(draft: DraftGraph, key: string, patch: Partial<Omit<DraftNode, "key">>): DraftGraph {
  return { ...draft, nodes: draft.nodes.map((n) => (n.key === key ? { ...n, ...patch } : n)) };
}

export function updateOption(draft: DraftGraph, key: string, patch: Partial<Omit<DraftOption, "key" | "fromKey">>): DraftGraph {
  return { ...draft, options: draft.options.map((o) => (o.key === key ? { ...o, ...patch } : o)) };
}

/** Neutral is stored as no entry: both mean the answer says nothing about the cause. */
export function setEvidence(draft: DraftGraph, optionKey: string, causeSlug: string, strength: StrengthName): DraftGraph {
  return {
    ...draft,
    options: draft.options.map((o) => {
      if (o.key !== optionKey) return o;
      const evidence = { ...o.evidence };
      if (strength === "neutral") delete evidence[causeSlug];
      else evidence[causeSlug] = strength;
      return { ...o, evidence };
    }),
  };
}

/** A new answer option from a question, check or caution node, optionally leading to `toKey`. */
export function addOption(draft: DraftGraph, fromKey: string, toKey: string | null, label?: string): { draft: DraftGraph; key: string } {
  const from = draft.nodes.find((n) => n.key === fromKey);
  if (!from || from.kind === "cause") return { draft, key: "" };
  const key = newOptionKey(draft, fromKey);
  const siblings = draft.options.filter((o) => o.fromKey === fromKey).length;
  const option: DraftOption = {
    key, fromKey, toKey, label: label ?? (asksSomething(from.kind) ? `Answer ${siblings + 1}` : "Go on"), dontKnow: false, evidence: {},
  };
  // Keep a node's answers together so their order on the node is the order they were added.
  const lastSibling = draft.options.map((o) => o.fromKey).lastIndexOf(fromKey);
  const options = [...draft.options];
  options.splice(lastSibling === -1 ? options.length : lastSibling + 1, 0, option);
  return { draft: { ...draft, options }, key };
}

/** Moves an answer one place up or down among the answers of its node. */
export function moveOption(draft: DraftGraph, key: string, direction: -1 | 1): DraftGraph {
  const index = draft.options.findIndex((o) => o.key === key);
  if (index === -1) return draft;
  const fromKey = draft.options[index].fromKey;
  let other = index + direction;
  while (other >= 0 && other < draft.options.length && draft.options[other].fromKey !== fromKey) other += direction;
  if (other < 0 || other >= draft.options.length) return draft;
  const options = [...draft.options];
  [options[index], options[other]] = [options[other], options[index]];
  return { ...draft, options };
}

export function setRoot(draft: DraftGraph, key: string): DraftGraph {
  return draft.rootKey === key ? draft : { ...draft, rootKey: key };
}

/** Adds catalogue causes to the tree (weight 1) unless listed already. */
export function addCauses(draft: DraftGraph, slugs: readonly string[]): DraftGraph {
  const listed = new Set(draft.causes.map((c) => c.slug));
  const added = slugs.filter((s, i) => !listed.has(s) && slugs.indexOf(s) === i);
  return added.length ? { ...draft, causes: [...draft.causes, ...added.map((slug) => ({ slug, priorWeight: 1 }))] } : draft;
}

/** Drops a cause from the tree and the evidence that named it; cause nodes linking it stay, and validation flags them. */
export function removeCause(draft: DraftGraph, slug: string): DraftGraph {
  return {
    ...draft,
    causes: draft.causes.filter((c) => c.slug !== slug),
    options: draft.options.map((o) => {
      if (!(slug in o.evidence)) return o;
      const evidence = { ...o.evidence };
      delete evidence[slug];
      return { ...o, evidence };
    }),
  };
}

export function setPriorWeight(draft: DraftGraph, slug: string, priorWeight: number): DraftGraph {
  return { ...draft, causes: draft.causes.map((c) => (c.slug === slug ? { ...c, priorWeight } : c)) };
}

/** Applies new positions; nodes whose position did not change keep their identity. */
export function moveNodes(draft: DraftGraph, positions: ReadonlyMap<string, { x: number; y: number }>): DraftGraph {
  let changed = false;
  const nodes = draft.nodes.map((n) => {
    const p = positions.get(n.key);
    if (!p) return n;
    const posX = Math.round(p.x);
    const posY = Math.round(p.y);
    if (posX === n.posX && posY === n.posY) return n;
    changed = true;
    return { ...n, posX, posY };
  });
  return changed ? { ...draft, nodes } : draft;
}
