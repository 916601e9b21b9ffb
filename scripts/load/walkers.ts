// Virtual technicians walking triage cases, for the load script, the fault test and the perceived
// benchmark. Each walker keeps one case going, answers its current question with a random option,
// and starts a new case when the walk ends. Answers go the way the triage screen sends them (the
// answerStep server action, as the browser posts it) or through POST /api/cases/:id/steps.
// With `thinkMs`, a walker waits a random time in that range before each answer, as a technician
// on the phone does (30–45 s in a real shop), its first wait drawn over the whole range so the
// walkers' answers are spread out from the start; without it they answer back to back, which is a
// stress and fault test, not a shop. Bounded by time and request count.
import { asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { caseSteps, motorFamilies, treeScope, treeVersions, trees } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { startCase } from "@/lib/triage/start";
import { walkPath, type DxAnswer } from "@/lib/diagnosis";
import { loadGraph, toDxTree, type TreeGraph } from "@/lib/trees/graph";
import type { ActionResult } from "@/lib/actions/define";
import type { AnsweredStep } from "@/lib/triage/answer";
import { callServerAction, serverActionId } from "./server-action";

export interface LoadOptions {
  baseUrl: string;
  walkers: number;
  seconds: number;
  maxRequests?: number;
  userId: string;
  /** "screen" (default): the server action the triage screen calls; "route": the JSON route. */
  via?: "screen" | "route";
  /** Ends the run early once Date.now() passes `at` (set by the caller while the run goes on). */
  stop?: { at: number };
  /** The pause before each answer, drawn uniformly from [min, max] ms; none when absent. */
  thinkMs?: ThinkTime;
}

export interface ThinkTime {
  min: number;
  max: number;
}

/** "30000-45000" (or one number) as a think time; `fallback` when the text is empty. */
export function parseThinkTime(text: string | undefined, fallback: ThinkTime): ThinkTime {
  if (!text?.trim()) return fallback;
  const [min, max = min] = text.split("-").map((part) => Number(part.trim()));
  if (!Number.isFinite(min) || !Number.isFinite(max) || min < 0 || max < min) throw new Error(`A think time is "min-max" in milliseconds, not "${text}"`);
  return { min, max };
}

export interface LoadResult {
  requests: number;
  ok: number;
  failed: number;
  errors: Record<string, number>;
  latenciesMs: number[];
  ackedStepIds: number[];
  caseIds: number[];
}

async function publishedTrees(): Promise<{ graph: TreeGraph; familyId: number }[]> {
  const versions = await db
    .select({ id: treeVersions.id, treeId: treeVersions.treeId })
    .from(treeVersions)
    .innerJoin(trees, eq(trees.id, treeVersions.treeId))
    .where(eq(treeVersions.state, "published"))
    .orderBy(asc(treeVersions.id));
  const families = await db.select({ id: motorFamilies.id }).from(motorFamilies).orderBy(asc(motorFamilies.id));
  const out: { graph: TreeGraph; familyId: number }[] = [];
  for (const v of versions) {
    const scope = await db.select({ familyId: treeScope.familyId }).from(treeScope).where(eq(treeScope.treeId, v.treeId));
    out.push({ graph: (await loadGraph(v.id))!, familyId: scope[0]?.familyId ?? families[0].id });
  }
  return out;
}

async function stepsOf(caseId: number, graph: TreeGraph): Promise<DxAnswer[]> {
  const rows = await db.select().from(caseSteps).where(eq(caseSteps.caseId, caseId)).orderBy(asc(caseSteps.seq));
  const nodeKey = new Map(graph.nodes.map((n) => [n.id, n.key]));
  const optionKey = new Map(graph.options.map((o) => [o.id, o.key]));
  return rows.map((r) => ({ nodeId: nodeKey.get(r.nodeId)!, optionId: optionKey.get(r.optionId)! }));
}

export async function runLoad(options: LoadOptions): Promise<LoadResult> {
  const treesAvailable = await publishedTrees();
  const result: LoadResult = { requests: 0, ok: 0, failed: 0, errors: {}, latenciesMs: [], ackedStepIds: [], caseIds: [] };
  const deadline = Date.now() + options.seconds * 1000;
  const running = () => Date.now() < deadline && Date.now() < (options.stop?.at ?? Infinity);
  const max = options.maxRequests ?? Number.POSITIVE_INFINITY;
  let counter = 0;
  const via = options.via ?? "screen";
  const answerActionId = via === "screen" ? serverActionId("app/(shop)/triage/actions.ts", "answerStep") : "";

  /** One answer; the stored step's id, or the reason it was not stored. */
  async function answer(caseId: number, nodeId: number, optionId: number, cookie: string): Promise<{ stepId: number } | { error: string }> {
    if (via === "route") {
      const response = await fetch(`${options.baseUrl}/api/cases/${caseId}/steps`, {
        method: "POST", headers: { cookie, "content-type": "application/json", origin: options.baseUrl }, body: JSON.stringify({ nodeId, optionId }),
      });
      if (response.status !== 201) {
        await response.text();
        return { error: `HTTP ${response.status}` };
      }
      return { stepId: ((await response.json()) as { step: { id: number } }).step.id };
    }
    const form = new FormData();
    form.set("caseId", String(caseId));
    form.set("nodeId", String(nodeId));
    form.set("optionId", String(optionId));
    const { status, value } = await callServerAction<ActionResult<AnsweredStep>>({
      baseUrl: options.baseUrl, pagePath: `/triage/${caseId}`, actionId: answerActionId, cookie, args: [null, form],
    });
    if (!value) return { error: `HTTP ${status}` };
    return value.ok ? { stepId: value.data.step.id } : { error: `action ${value.status}` };
  }

  /** Waits `ms`, or less once the run is over. */
  async function pause(ms: number) {
    const until = Date.now() + ms;
    while (running() && Date.now() < until) await new Promise((r) => setTimeout(r, Math.min(250, until - Date.now())));
  }

  async function walker(index: number) {
    const { token } = await createSession(options.userId);
    const cookie = `rb_session=${token}`;
    const think = options.thinkMs;
    let first = true;
    const thinkBeforeAnswer = async () => {
      if (!think) return;
      await pause(first ? Math.random() * think.max : think.min + Math.random() * (think.max - think.min));
      first = false;
    };
    while (running() && result.requests < max) {
      const { graph, familyId } = treesAvailable[(index + counter++) % treesAvailable.length];
      const dx = toDxTree(graph);
      let created: { id: number };
      try {
        created = await startCase({
          callerName: `Load caller ${index}`, callerKind: "rider", phone: "+00 555 0000 0000", email: "", familyId,
          serial: "", ridingUse: "road", treeVersionId: graph.versionId, callerWords: "",
        }, options.userId);
      } catch {
        await new Promise((r) => setTimeout(r, 200));
        continue;
      }
      result.caseIds.push(created.id);
      let answers: DxAnswer[] = [];
      while (running() && result.requests < max) {
        const current = walkPath(dx, answers).current;
        if (!current) break;
        const choices = graph.options.filter((o) => o.fromKey === current);
        const option = choices[Math.floor(Math.random() * choices.length)];
        const node = graph.nodes.find((n) => n.key === current)!;
        await thinkBeforeAnswer();
        if (!running()) break;
        const started = performance.now();
        result.requests++;
        try {
          const outcome = await answer(created.id, node.id, option.id, cookie);
          const elapsed = performance.now() - started;
          if ("stepId" in outcome) {
            result.ok++;
            result.latenciesMs.push(elapsed);
            result.ackedStepIds.push(outcome.stepId);
            answers.push({ nodeId: current, optionId: option.key });
          } else {
            result.failed++;
            result.errors[outcome.error] = (result.errors[outcome.error] ?? 0) + 1;
            answers = await resync(created.id, graph);
          }
        } catch (error) {
          result.failed++;
          const key = error instanceof Error ? error.message.slice(0, 60) : "network error";
          result.errors[key] = (result.errors[key] ?? 0) + 1;
          await new Promise((r) => setTimeout(r, 100));
          answers = await resync(created.id, graph);
        }
      }
    }
  }

  // After a failure the walker re-reads what the server stored, as the triage screen does.
  async function resync(caseId: number, graph: TreeGraph): Promise<DxAnswer[]> {
    for (let attempt = 0; attempt < 50; attempt++) {
      try {
        return await stepsOf(caseId, graph);
      } catch {
        await new Promise((r) => setTimeout(r, 200));
      }
    }
    return [];
  }

  await Promise.all(Array.from({ length: options.walkers }, (_, i) => walker(i)));
  return result;
}

/** Steps the server acknowledged but the database lacks, and steps per case beyond what was acknowledged. */
export async function auditSteps(result: LoadResult): Promise<{ stored: number; missing: number; unacknowledged: number }> {
  if (result.caseIds.length === 0) return { stored: 0, missing: 0, unacknowledged: 0 };
  const rows = await db.select({ id: caseSteps.id }).from(caseSteps).where(inArray(caseSteps.caseId, result.caseIds));
  const stored = new Set(rows.map((r) => r.id));
  const missing = result.ackedStepIds.filter((id) => !stored.has(id)).length;
  return { stored: stored.size, missing, unacknowledged: stored.size - (result.ackedStepIds.length - missing) };
}

export function percentile(values: number[], p: number): number {
  if (!values.length) return 0;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

