import { beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/trees/[id]/route";
import { GET as EXPORT } from "@/app/api/trees/[id]/export/route";
import type { TreeGraphResponse } from "@/lib/trees/client";
import { createRoleUsers } from "../../support/db";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";
import { openDraft, treeBySlug } from "./helpers";

describe("GET /api/trees/[id]", () => {
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let treeId: number;
  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    treeId = (await treeBySlug("clicking-under-load")).id;
    await openDraft("clicking-under-load", users.senior);
  });

  const get = (token: string, query = "") => GET(request(`/api/trees/${treeId}${query}`, { token }), params({ id: String(treeId) }));

  it("gives editors the draft and everyone else the latest published version", async () => {
    const senior = (await (await get(users.senior.token)).json()) as TreeGraphResponse;
    expect([senior.version.number, senior.version.state]).toEqual([2, "draft"]);
    expect(senior.graph.nodes.length).toBeGreaterThan(10);
    expect(senior.problems).toEqual([]);
    const trainee = (await (await get(users.trainee.token)).json()) as TreeGraphResponse;
    expect([trainee.version.number, trainee.version.state]).toEqual([1, "published"]);
  });

  it("shows a draft by number to editors only, and answers 404 for what does not exist", async () => {
    expect((await get(users.admin.token, "?version=2")).status).toBe(200);
    expect((await get(users.tech.token, "?version=2")).status).toBe(403);
    expect((await get(users.lead.token, "?version=1")).status).toBe(200);
    expect((await get(users.senior.token, "?version=9")).status).toBe(404);
    expect((await get(users.senior.token, "?version=abc")).status).toBe(404);
    const missing = await GET(request("/api/trees/424242", { token: users.senior.token }), params({ id: "424242" }));
    expect(missing.status).toBe(404);
  });

  it("exports a draft to editors only", async () => {
    const draft = await EXPORT(request(`/api/trees/${treeId}/export?version=2`, { token: users.trainee.token }), params({ id: String(treeId) }));
    expect(draft.status).toBe(403);
    const ok = await EXPORT(request(`/api/trees/${treeId}/export?version=2`, { token: users.senior.token }), params({ id: String(treeId) }));
    expect([ok.status, ok.headers.get("content-disposition")]).toEqual([200, 'attachment; filename="clicking-under-load-v2.json"']);
  });
});
