import type { Tx } from "@/db";
import type { Content } from "@/db/seed/content";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { insertHistory } from "./insert";
import { simulateHistory } from "./simulate";

export interface SeedHistoryIds {
  familyId: Map<string, number>;
  causeId: Map<string, number>;
  partId: Map<string, number>;
  userOfRole: Map<string, string>;
  versionOf: Map<string, number>;
}

/** The simulated two years of the demo shop, ending on `anchor` (default: today). */
export async function seedHistory(tx: Tx, content: Content, ids: SeedHistoryIds, anchor = startOfToday()): Promise<number> {
  const graphs = new Map<string, TreeGraph>();
  for (const [slug, versionId] of ids.versionOf) graphs.set(slug, (await loadGraph(versionId, tx))!);
  const sims = simulateHistory({
    scenario: content.scenario,
    causes: content.causes,
    trees: content.trees.map((t) => ({ slug: t.slug, symptom: t.symptom, dx: toDxTree(graphs.get(t.slug)!) })),
    anchor,
  });
  await insertHistory(tx, sims, { ...ids, graphs });
  return sims.length;
}

function startOfToday(): Date {
  const d = new Date();
  d.setUTCHours(0, 0, 0, 0);
  return d;
}
