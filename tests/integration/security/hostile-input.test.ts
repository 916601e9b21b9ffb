import path from "node:path";
import { sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { executeAction } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { createRoleUsers, createUser, db } from "../../support/db";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";
import { ACTION_ENTRIES, ROUTE_ENTRIES } from "../auth/entry-points";

const ROOT = path.resolve(__dirname, "../../..");

/** Row count of every table: a refused request must leave all of them as they were. */
async function allCounts(): Promise<Record<string, number>> {
  const tables = await db.execute<{ tablename: string }>(sql`select tablename from pg_tables where schemaname = 'public' order by 1`);
  const parts = tables.map((t) => `select '${t.tablename}' as t, count(*)::int as n from "${t.tablename}"`).join(" union all ");
  const rows = await db.execute<{ t: string; n: number }>(sql.raw(parts));
  return Object.fromEntries(rows.map((r) => [r.t, r.n]));
}

const HUGE = "x".repeat(200_000);
const HOSTILE_IDS = ["1 OR 1=1", "'; drop table users; --", "../../../../etc/passwd", "%00", "-1", "9999999999999999999999"];

type Mutation = { name: string; apply: (sample: Record<string, unknown>) => Record<string, unknown> | null };

/** Ways to break a valid input; each must be refused with a 4xx and change nothing. */
function mutationsOf(sample: Record<string, unknown>): Mutation[] {
  const keys = Object.keys(sample);
  const out: Mutation[] = [{ name: "empty body", apply: () => (keys.length ? {} : null) }];
  for (const key of keys) {
    out.push({ name: `${key} as an object`, apply: (s) => ({ ...s, [key]: { $gt: "" } }) });
    out.push({ name: `${key} 200k characters`, apply: (s) => ({ ...s, [key]: HUGE }) });
    out.push({ name: `${key} with a NUL byte`, apply: (s) => ({ ...s, [key]: `${String(s[key] ?? "")}\u0000x` }) });
    if (/id$/i.test(key)) {
      for (const bad of HOSTILE_IDS) out.push({ name: `${key} = ${JSON.stringify(bad)}`, apply: (s) => ({ ...s, [key]: bad }) });
    }
  }
  return out;
}

describe("hostile input to every server action", () => {
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
  });

  for (const entry of ACTION_ENTRIES.filter((e) => e.spec)) {
    const role: Role | null = entry.allowed === "public" ? null : (entry.allowed.includes("admin") ? "admin" : entry.allowed[0]);
    it(`${entry.file}#${entry.exportName}: malformed inputs get a 4xx and write nothing`, async () => {
      const caller = role ? users[role] : null;
      const target = await createUser("tech");
      const fixture = entry.setup ? await entry.setup({ caller, target }) : {};
      const sample = entry.sample({ caller, target, fixture });
      for (const mutation of mutationsOf(sample)) {
        const input = mutation.apply(sample);
        if (!input) continue;
        const before = await allCounts();
        const result = await executeAction(entry.spec!, input, caller);
        const label = `${entry.exportName} with ${mutation.name}`;
        expect(result.ok, label).toBe(false);
        if (!result.ok) {
          expect(result.status, `${label}: ${result.error}`).toBeGreaterThanOrEqual(400);
          expect(result.status, `${label}: ${result.error}`).toBeLessThan(500);
          expect(result.error.length, label).toBeGreaterThan(0);
        }
        expect(await allCounts(), label).toEqual(before);
      }
    });
  }
});

const WRITE_ROUTES = ROUTE_ENTRIES.filter((e) => e.method !== "GET" && e.method !== "DELETE");

if (WRITE_ROUTES.length) describe("hostile input to every route handler that writes", () => {
  let admin: string;
  beforeAll(async () => {
    admin = (await createRoleUsers()).admin.token;
  });

  for (const entry of WRITE_ROUTES) {
    it(`${entry.method} ${entry.path}: a broken or oversized body gets a 4xx and writes nothing`, async () => {
      const mod = await import(path.join(ROOT, entry.file));
      const handler = mod[entry.method] as (req: unknown, ctx: unknown) => Promise<Response>;
      const fixture = entry.setup ? await entry.setup() : {};
      for (const body of ["{not json", JSON.stringify({ payload: HUGE }), JSON.stringify([1, 2, 3]), JSON.stringify({ text: "a\u0000b" })]) {
        const before = await allCounts();
        const req = request(entry.path, { method: entry.method, token: admin, headers: { "content-type": "application/json" } });
        const withBody = new Request(req.url, { method: entry.method, headers: req.headers, body });
        const response = await handler(Object.assign(withBody, { cookies: req.cookies, nextUrl: req.nextUrl }), params(fixture.params ?? entry.params ?? {}));
        expect(response.status, `${entry.path} with ${body.slice(0, 20)}`).toBeGreaterThanOrEqual(400);
        expect(response.status).toBeLessThan(500);
        expect(await allCounts()).toEqual(before);
      }
    });
  }
});
