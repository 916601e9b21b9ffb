import "server-only";
import { walkPath, type DxAnswer, type DxSettings } from "@/lib/diagnosis";
import { deepFreeze } from "./deep-freeze";
import { computeRanking } from "./ranking";
import type { StoredRanking } from "./ranking-types";
import type { CaseTree } from "./tree-cache";

/**
 * Rankings worked out before they are asked for. While the caller thinks about the question on
 * screen, the server scores each answer they can give to it and to the top suggested questions
 * (the ones the technician may jump to), so the answer that follows finds its ranking ready and
 * the answer action spends its time on the write alone. An entry is the engine's own result for
 * exactly that tree, answer list and settings (the key holds all three), so using one can never
 * change what is stored: a miss just computes as before.
 */

const MAX_ENTRIES = 2000;
/** Suggested questions scored ahead, besides the tree's own next question. */
export const AHEAD_SUGGESTIONS = 3;

const globalStore = globalThis as unknown as { rootbenchAnticipated?: Map<string, StoredRanking> };
// Most recently used last; about 4 KB a ranking, so at most ~8 MB.
const store: Map<string, StoredRanking> = (globalStore.rootbenchAnticipated ??= new Map());
const treeIds = new WeakMap<CaseTree, number>();
const likelihoodIds = new WeakMap<object, number>();
let nextId = 1;

function idOf<T extends object>(ids: WeakMap<T, number>, value: T): number {
  let id = ids.get(value);
  if (id === undefined) ids.set(value, (id = nextId++));
  return id;
}

/** Everything the ranking depends on. Learned likelihoods are cached objects, so they count by identity. */
function keyOf(tree: CaseTree, answers: DxAnswer[], settings: DxSettings): string {
  const { likelihoods, ...plain } = settings;
  const learned = likelihoods && Object.keys(likelihoods).length > 0 ? idOf(likelihoodIds, likelihoods) : 0;
  let key = `${idOf(treeIds, tree)}|${learned}|${JSON.stringify(plain)}|`;
  for (const a of answers) key += `${a.nodeId}=${a.optionId};`;
  return key;
}

/** The ranking after `answers` if it was worked out ahead, else undefined. */
export function anticipatedRanking(tree: CaseTree, answers: DxAnswer[], settings: DxSettings): StoredRanking | undefined {
  const key = keyOf(tree, answers, settings);
  const hit = store.get(key);
  if (hit) {
    store.delete(key);
    store.set(key, hit);
  }
  return hit;
}

function put(key: string, ranking: StoredRanking): void {
  store.set(key, deepFreeze(ranking));
  while (store.size > MAX_ENTRIES) store.delete(store.keys().next().value as string);
}

/** The questions the next answer is most likely for: the tree's next one, then the top suggestions. */
export function likelyNextQuestions(tree: CaseTree, answers: DxAnswer[], ranking: Pick<StoredRanking, "suggestions">): string[] {
  const answered = new Set(answers.map((a) => a.nodeId));
  const keys = new Set<string>();
  const next = walkPath(tree.dx, answers).current;
  if (next) keys.add(next);
  for (const s of ranking.suggestions.slice(0, AHEAD_SUGGESTIONS)) keys.add(s.nodeId);
  return [...keys].filter((key) => !answered.has(key) && tree.nodeByKey.has(key));
}

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/**
 * Scores every option of the likely next questions after `answers`, one engine run per turn of
 * the event loop so requests keep being served in between. Resolves when done; callers do not
 * wait for it. Errors are dropped: the answer itself will compute (and report) on a miss.
 */
export async function anticipate(tree: CaseTree, answers: DxAnswer[], settings: DxSettings, ranking: Pick<StoredRanking, "suggestions">): Promise<number> {
  let scored = 0;
  try {
    await nextTurn();
    for (const nodeKey of likelyNextQuestions(tree, answers, ranking)) {
      for (const option of tree.graph.options) {
        if (option.fromKey !== nodeKey) continue;
        const next = [...answers, { nodeId: nodeKey, optionId: option.key }];
        const key = keyOf(tree, next, settings);
        if (store.has(key)) continue;
        put(key, computeRanking(tree.dx, next, settings, tree.models));
        scored++;
        await nextTurn();
      }
    }
  } catch {
    // A miss later computes in the request and reports whatever this was.
  }
  return scored;
}

/** Tests start from nothing anticipated. */
export function forgetAnticipated(): void {
  store.clear();
}

