// Two app processes from one build behind HAProxy, on one database and one fake S3 bucket (started
// by scripts/test.sh with the same parts as `npm run cluster`). Whatever one process does, the
// other must see: nothing that matters may live in one process only.
import { asc, eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, sql } from "@/db";
import { caseSteps, treeVersions, trees, users } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { createSession } from "@/lib/auth/session";
import { startCase } from "@/lib/triage/start";
import { walkPath, type DxAnswer } from "@/lib/diagnosis";
import { blobStore } from "@/lib/storage";
import { graphToDraft } from "@/lib/trees/draft";
import { startDraftAction, saveDraftAction } from "@/lib/trees/actions";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { openBrowser, type Browser } from "../e2e/support/browser";
import { TreeEditorPage } from "../e2e/pages/tree-editor-page";

const BALANCER = process.env.CLUSTER_BASE_URL!;
const [A, B] = process.env.CLUSTER_APP_URLS!.split(" ");
const DEMO_PASSWORD = "bench-demo-2026";

let browser: Browser;
beforeAll(async () => { browser = await openBrowser(); });
afterAll(async () => {
  await browser?.close();
  await sql.end({ timeout: 5 });
});

async function userId(email: string): Promise<string> {
  const [u] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return u.id;
}

async function signInThrough(base: string, email: string): Promise<string> {
  const page = browser.page;
  await browser.context.clearCookies();
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout: 30_000 });
  const cookie = (await browser.context.cookies()).find((c) => c.name === "rb_session");
  return cookie!.value;
}

const asUser = (token: string, base: string) => ({ cookie: `rb_session=${token}`, origin: base });

describe("two app processes behind HAProxy", () => {
  it("each process and HAProxy in front of them answer /api/health", async () => {
    for (const base of [A, B, BALANCER]) expect((await fetch(`${base}/api/health`)).status).toBe(200);
  });

  it("a session made by signing in through one process is valid on the other", async () => {
    const token = await signInThrough(A, "tech@rootbench.test");
    const onB = await fetch(`${B}/api/session`, { headers: asUser(token, B) });
    expect(onB.status).toBe(200);
    expect(((await onB.json()) as { user: { email: string } }).user.email).toBe("tech@rootbench.test");
  });

  it("a photo uploaded through one process is served through the other, from the bucket", async () => {
    const { token } = await createSession(await userId("tech@rootbench.test"));
    const png = await sharp({ create: { width: 80, height: 60, channels: 3, background: "#2a6b8c" } }).png().toBuffer();
    const form = new FormData();
    form.set("file", new Blob([png as BlobPart], { type: "image/png" }), "bench.png");
    const posted = await fetch(`${A}/api/uploads`, { method: "POST", body: form, headers: asUser(token, A) });
    expect(posted.status).toBe(201);
    const { id } = (await posted.json()) as { id: string };
    const served = await fetch(`${B}/api/uploads/${id}`, { headers: asUser(token, B) });
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("image/png");
    expect((await served.arrayBuffer()).byteLength).toBeGreaterThan(0);
    expect((await fetch(`${B}/api/uploads/${id}/thumb`, { headers: asUser(token, B) })).status).toBe(200);
    // Only the app serves it: without a session the route refuses.
    expect((await fetch(`${B}/api/uploads/${id}`)).status).toBe(401);
    let inBucket = 0;
    for await (const o of blobStore().list()) if (o.key.startsWith("photos/")) inBucket++;
    expect(inBucket).toBeGreaterThanOrEqual(2);
  });

  it("answers recorded alternately through each process follow on from each other", async () => {
    const tech = await userId("tech@rootbench.test");
    const { token } = await createSession(tech);
    const [version] = await sql<{ id: number }[]>`select max(id) as id from tree_versions where state = 'published' group by tree_id order by 1 limit 1`;
    const graph = (await loadGraph(version.id))!;
    const dx = toDxTree(graph);
    const [scope] = await sql<{ id: number }[]>`select family_id as id from tree_scope s join tree_versions v on v.tree_id = s.tree_id where v.id = ${version.id} limit 1`;
    const familyId = scope?.id ?? (await sql<{ id: number }[]>`select id from motor_families order by id limit 1`)[0].id;
    const created = await startCase({
      callerName: "Cluster caller", callerKind: "rider", phone: "+00 555 0100 0000", email: "", familyId,
      serial: "", ridingUse: "road", treeVersionId: version.id, callerWords: "",
    }, tech);
    const answers: DxAnswer[] = [];
    const through = [B, A, B, A];
    for (const base of through) {
      const current = walkPath(dx, answers).current;
      if (!current) break;
      const node = graph.nodes.find((n) => n.key === current)!;
      const option = graph.options.find((o) => o.fromKey === current && !o.dontKnow)!;
      const res = await fetch(`${base}/api/cases/${created.id}/steps`, {
        method: "POST", headers: { ...asUser(token, base), "content-type": "application/json" },
        body: JSON.stringify({ nodeId: node.id, optionId: option.id }),
      });
      expect(res.status, `answer through ${base}`).toBe(201);
      answers.push({ nodeId: current, optionId: option.key });
    }
    expect(answers.length).toBeGreaterThanOrEqual(2);
    const stored = await db.select({ seq: caseSteps.seq }).from(caseSteps).where(eq(caseSteps.caseId, created.id)).orderBy(asc(caseSteps.seq));
    expect(stored.map((s) => s.seq)).toEqual(answers.map((_, i) => i + 1));
  });

  it("a tree edited and republished through one process is what a new case gets through the other", async () => {
    const [senior] = await db.select({ id: users.id, email: users.email, name: users.name, role: users.role }).from(users)
      .where(eq(users.email, "senior@rootbench.test")) as SessionUser[];
    const [tree] = await db.select({ id: trees.id }).from(trees).orderBy(asc(trees.id)).limit(1);
    // The edit: the draft (started from the published version) gets new wording on its first question.
    const started = await executeAction(startDraftAction, { treeId: tree.id }, senior);
    if (!started.ok) throw new Error(started.error);
    const draftId = (started.data as { versionId: number }).versionId;
    const draft = graphToDraft((await loadGraph(draftId))!);
    const first = draft.nodes.find((n) => n.kind === "question")!;
    const wording = `Reworded in the cluster test ${Date.now()}?`;
    first.prompt = wording;
    first.title = wording.slice(0, 60);
    const [{ revision }] = await db.select({ revision: treeVersions.revision }).from(treeVersions).where(eq(treeVersions.id, draftId));
    const saved = await executeAction(saveDraftAction, { versionId: draftId, revision, graph: draft }, senior);
    expect(saved.ok).toBe(true);

    // Published through process A's editor (its server action, its process).
    await signInThrough(A, "senior@rootbench.test");
    await browser.page.goto(`${A}/trees/${tree.id}/edit`);
    const editor = new TreeEditorPage(browser.page);
    await editor.waitReady();
    await editor.publish("Reworded first question");
    await browser.page.getByText(/Version \d+ is published\./).waitFor({ timeout: 30_000 });
    const [{ state }] = await db.select({ state: treeVersions.state }).from(treeVersions).where(eq(treeVersions.id, draftId));
    expect(state).toBe("published");

    // Through process B, a new case is offered the republished version and walks its new wording.
    const [scope] = await sql<{ id: number }[]>`
      select coalesce((select family_id from tree_scope where tree_id = ${tree.id} limit 1), (select min(id) from motor_families)) as id`;
    await signInThrough(B, "senior@rootbench.test");
    const page = browser.page;
    await page.goto(`${B}/triage/new`);
    await page.getByLabel("Caller's name").fill("Cluster caller");
    await page.getByLabel("Phone").fill("+00 555 0100 0001");
    await page.getByLabel("Motor family").selectOption(String(scope.id));
    const choice = page.locator(`input[name="treeVersionId"][value="${draftId}"]`);
    await choice.check();
    await page.getByRole("button", { name: "Start the walk" }).click();
    await page.getByText(wording).first().waitFor({ timeout: 30_000 });
    const [newest] = await sql<{ v: number }[]>`select tree_version_id as v from cases order by id desc limit 1`;
    expect(newest.v).toBe(draftId);
  });
});
