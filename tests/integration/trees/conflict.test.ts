import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { publishDraftAction } from "@/lib/trees/actions";
import { clockTime } from "@/lib/format";
import { graphToDraft } from "@/lib/trees/draft";
import { loadGraph } from "@/lib/trees/graph";
import { updateNode } from "@/lib/trees/ops";
import { createUser } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { openDraft, save } from "./helpers";

describe("two editors on one draft", () => {
  let first: SessionUser;
  let second: SessionUser;
  beforeAll(async () => {
    await resetToDemo();
    first = await createUser("senior", { name: "Ilse Marrow" });
    second = await createUser("admin", { name: "Bram Tolliver" });
  });

  it("the second save carries a stale revision and is refused with who saved and when; nothing of it is written", async () => {
    const { version, graph } = await openDraft("grinding-noise", first);
    const key = graph.nodes[0].key;
    const mine = updateNode(graph, key, { title: "First editor's title" });
    const theirs = updateNode(graph, key, { title: "Second editor's title" });

    const ok = await save(first, version.id, version.revision, mine);
    expect(ok.ok).toBe(true);
    const [afterFirst] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));

    const stale = await save(second, version.id, version.revision, theirs);
    expect(stale.ok).toBe(false);
    if (!stale.ok) {
      expect(stale.status).toBe(409);
      expect(stale.error).toBe(`Ilse Marrow saved this draft at ${clockTime(afterFirst.editedAt)}, after you opened it. Reload to see their changes; your edits stay on screen until you do.`);
    }
    const stored = graphToDraft((await loadGraph(version.id))!);
    expect(stored.nodes.find((n) => n.key === key)?.title).toBe("First editor's title");

    // After reloading (the current revision) the second editor's save goes through.
    const retried = await save(second, version.id, afterFirst.revision, theirs);
    expect(retried.ok).toBe(true);
  });

  it("two saves at the same moment from the same revision: exactly one wins", async () => {
    const { version, graph } = await openDraft("grinding-noise", first);
    const [current] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));
    const key = graph.nodes[0].key;
    const results = await Promise.all([
      save(first, version.id, current.revision, updateNode(graph, key, { title: "Race A" })),
      save(second, version.id, current.revision, updateNode(graph, key, { title: "Race B" })),
    ]);
    expect(results.map((r) => r.ok).sort()).toEqual([false, true]);
    const loser = results.find((r) => !r.ok);
    expect(loser && !loser.ok && loser.status).toBe(409);
    const winner = results[0].ok ? "Race A" : "Race B";
    expect(graphToDraft((await loadGraph(version.id))!).nodes.find((n) => n.key === key)?.title).toBe(winner);
  });

  it("publishing from a stale revision is refused too", async () => {
    const { version } = await openDraft("grinding-noise", first);
    const result = await executeAction(publishDraftAction, { versionId: version.id, revision: 1 }, second);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.status).toBe(409);
  });
});
