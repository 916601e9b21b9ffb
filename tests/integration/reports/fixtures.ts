import { eq } from "drizzle-orm";
import { db } from "@/db";
import { caseOutcomes, cases, caseSteps, causes, motorFamilies, outcomeCauses, outcomeParts, parts, trees, treeVersions, type CaseStatus } from "@/db/schema";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { storeTriageScores } from "@/lib/reports/triage-scores";
import { storePlannedTeardown } from "@/lib/bench/planned-teardown";
import { relearn } from "@/lib/review/learned";
import { loadGraph } from "@/lib/trees/graph";

/** Catalogue and tree ids of the demo content loaded by resetToDemo(). */
export interface DemoIds {
  family: (slug: string) => number;
  cause: (slug: string) => number;
  part: (slug: string) => number;
  /** The published version of a tree, with a (node, option) pair to write steps with. */
  version: (treeSlug: string) => VersionIds;
}

export interface VersionIds {
  id: number;
  nodeId: number;
  optionId: number;
  /** Option key → its node's id and its own id. */
  option: (key: string) => { nodeId: number; optionId: number };
}

export async function demoIds(): Promise<DemoIds> {
  const [familyRows, causeRows, partRows, versionRows] = await Promise.all([
    db.select({ id: motorFamilies.id, slug: motorFamilies.slug }).from(motorFamilies),
    db.select({ id: causes.id, slug: causes.slug }).from(causes),
    db.select({ id: parts.id, slug: parts.slug }).from(parts),
    db.select({ id: treeVersions.id, slug: trees.slug }).from(treeVersions).innerJoin(trees, eq(trees.id, treeVersions.treeId)).where(eq(treeVersions.state, "published")),
  ]);
  const versions = new Map<string, VersionIds>();
  for (const v of versionRows) {
    const graph = (await loadGraph(v.id))!;
    const nodeIdOf = new Map(graph.nodes.map((n) => [n.key, n.id]));
    const option = (key: string) => {
      const o = graph.options.find((x) => x.key === key);
      if (!o) throw new Error(`no option ${key} in ${v.slug}`);
      return { nodeId: nodeIdOf.get(o.fromKey)!, optionId: o.id };
    };
    const first = graph.options.find((o) => o.fromKey === graph.rootKey)!;
    versions.set(v.slug, { id: v.id, ...option(first.key), option });
  }
  const get = <T>(map: Map<string, T>, what: string) => (key: string): T => {
    const value = map.get(key);
    if (value === undefined) throw new Error(`no ${what} ${key} in the demo content`);
    return value;
  };
  return {
    family: get(new Map(familyRows.map((r) => [r.slug, r.id])), "family"),
    cause: get(new Map(causeRows.map((r) => [r.slug, r.id])), "cause"),
    part: get(new Map(partRows.map((r) => [r.slug, r.id])), "part"),
    version: get(versions, "tree"),
  };
}

export interface CaseSpec {
  family: string;
  tree: string;
  status?: CaseStatus;
  createdAt?: Date;
  closedAt?: Date | null;
  /** Primary confirmed cause slug; null records an "other" outcome (cause not in the catalogue). */
  primary?: string | null;
  secondary?: string[];
  parts?: { slug: string; quantity: number }[];
  ranking?: Record<string, number> | null;
  /** Write one triage step (default true); imported records have none. */
  steps?: boolean;
  /** The triage answers as option keys, in order (instead of the one default step). */
  answers?: string[];
  serial?: string;
  repeatOf?: number | null;
  reference?: string;
}

let counter = 0;

/**
 * Inserts cases with their outcomes in bulk, then learns the touched versions' likelihood tables
 * again, as the seed does after its history; returns their ids in spec order.
 */
export async function insertCases(ids: DemoIds, specs: CaseSpec[]): Promise<number[]> {
  const out: number[] = [];
  for (let start = 0; start < specs.length; start += 400) {
    const group = specs.slice(start, start + 400);
    const rows = await db.insert(cases).values(group.map((s) => {
      const closedAt = s.closedAt ?? null;
      const createdAt = s.createdAt ?? (closedAt ? new Date(closedAt.getTime() - 5 * 86_400_000) : new Date());
      return {
        reference: s.reference ?? `T-${(++counter).toString().padStart(6, "0")}-${Math.random().toString(36).slice(2, 6)}`,
        status: s.status ?? "closed", callerName: "Test caller", callerKind: "rider" as const, familyId: ids.family(s.family),
        serial: s.serial ?? "", ridingUse: "road" as const, symptom: s.tree, treeVersionId: ids.version(s.tree).id,
        finalRanking: s.ranking ?? null, createdAt, closedAt, repeatOfCaseId: s.repeatOf ?? null,
      };
    })).returning({ id: cases.id });
    const caseIds = rows.map((r) => r.id);
    out.push(...caseIds);
    const withOutcome = group.map((s, i) => ({ s, id: caseIds[i] })).filter(({ s }) => s.primary !== undefined);
    if (withOutcome.length) {
      await db.insert(caseOutcomes).values(withOutcome.map(({ s, id }) => ({ caseId: id, otherCause: s.primary === null ? "Something else entirely" : "" })));
      const causeRows = withOutcome.flatMap(({ s, id }) => [
        ...(s.primary ? [{ caseId: id, causeId: ids.cause(s.primary), primary: true }] : []),
        ...(s.secondary ?? []).map((slug) => ({ caseId: id, causeId: ids.cause(slug), primary: false })),
      ]);
      if (causeRows.length) await db.insert(outcomeCauses).values(causeRows);
    }
    const partRows = group.flatMap((s, i) => (s.parts ?? []).map((p) => ({ caseId: caseIds[i], partId: ids.part(p.slug), quantity: p.quantity })));
    if (partRows.length) await db.insert(outcomeParts).values(partRows);
    await db.transaction(async (tx) => {
      await storeOutcomeCopies(tx, caseIds);
      await storeTriageScores(tx, withOutcome.map(({ id }) => id));
      await storePlannedTeardown(tx, withOutcome.map(({ id }) => id));
    });
    const stepRows = group.flatMap((s, i) => {
      if (s.steps === false) return [];
      const v = ids.version(s.tree);
      const answers = s.answers?.map((key) => v.option(key)) ?? [{ nodeId: v.nodeId, optionId: v.optionId }];
      return answers.map((a, seq) => ({ caseId: caseIds[i], seq: seq + 1, ...a, ranking: {} }));
    });
    if (stepRows.length) await db.insert(caseSteps).values(stepRows);
  }
  const versions = [...new Set(specs.map((s) => ids.version(s.tree).id))].sort((a, b) => a - b);
  await db.transaction(async (tx) => {
    for (const v of versions) await relearn(tx, v);
  });
  return out;
}

/** n copies of a spec. */
export const times = (n: number, spec: CaseSpec): CaseSpec[] => Array.from({ length: n }, () => ({ ...spec }));

export const day = (iso: string) => new Date(`${iso}T12:00:00Z`);
