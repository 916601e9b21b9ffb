import { readFileSync, readdirSync, statSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { executeAction } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { ALL_ROLES } from "@/lib/auth/roles";
import { createRoleUsers, createUser } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { params, request } from "../../support/requests";
import { ACTION_ENTRIES, ROUTE_ENTRIES } from "./entry-points";

const ROOT = path.resolve(__dirname, "../../..");

function filesNamed(dir: string, name: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir)) {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) out.push(...filesNamed(full, name));
    else if (entry === name) out.push(path.relative(ROOT, full));
  }
  return out;
}

const callers: (Role | null)[] = [null, ...ALL_ROLES];
const label = (r: Role | null) => r ?? "signed-out";

function expectedStatus(allowed: readonly Role[] | "public", caller: Role | null): "allowed" | 401 | 403 {
  if (allowed === "public") return "allowed";
  if (!caller) return 401;
  return allowed.includes(caller) ? "allowed" : 403;
}

describe("every entry point on disk has a row in the role table", () => {
  it("server actions", () => {
    const onDisk = filesNamed(path.join(ROOT, "app"), "actions.ts").flatMap((file) => {
      const text = readFileSync(path.join(ROOT, file), "utf8");
      return [...text.matchAll(/export async function (\w+)/g)].map((m) => `${file}#${m[1]}`);
    });
    const listed = ACTION_ENTRIES.map((e) => `${e.file}#${e.exportName}`);
    expect(onDisk.length).toBeGreaterThan(0);
    expect(onDisk.filter((k) => !listed.includes(k))).toEqual([]);
    expect(listed.filter((k) => !onDisk.includes(k))).toEqual([]);
  });

  it("each listed server action runs the spec the table names", () => {
    for (const entry of ACTION_ENTRIES.filter((e) => e.spec)) {
      const text = readFileSync(path.join(ROOT, entry.file), "utf8");
      const body = text.split(`export async function ${entry.exportName}(`)[1]?.split(/\nexport /)[0] ?? "";
      expect(body, `${entry.file}#${entry.exportName}`).toMatch(/(runAction|executeAction)\(\s*\w+Action\b/);
    }
  });

  it("route handlers", () => {
    const onDisk = filesNamed(path.join(ROOT, "app"), "route.ts").flatMap((file) => {
      const text = readFileSync(path.join(ROOT, file), "utf8");
      return [...text.matchAll(/export (?:const|async function) (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => `${file}#${m[1]}`);
    });
    const listed = ROUTE_ENTRIES.map((e) => `${e.file}#${e.method}`);
    expect(onDisk.filter((k) => !listed.includes(k))).toEqual([]);
    expect(listed.filter((k) => !onDisk.includes(k))).toEqual([]);
  });
});

describe("role matrix", () => {
  let users: Awaited<ReturnType<typeof createRoleUsers>>;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
  });

  for (const entry of ACTION_ENTRIES.filter((e) => e.spec)) {
    for (const caller of callers) {
      const expected = expectedStatus(entry.allowed, caller);
      it(`action ${entry.exportName} as ${label(caller)} → ${expected}`, async () => {
        const target = await createUser("tech");
        const user = caller ? users[caller] : null;
        const fixture = entry.setup ? await entry.setup({ caller: user, target }) : {};
        const result = await executeAction(entry.spec!, entry.sample({ caller: user, target, fixture }), user);
        if (expected === "allowed") {
          expect(result.ok || ![401, 403].includes(result.status), JSON.stringify(result)).toBe(true);
        } else {
          expect(result.ok).toBe(false);
          if (!result.ok) expect(result.status).toBe(expected);
        }
      });
    }
  }

  for (const entry of ROUTE_ENTRIES) {
    for (const caller of callers) {
      const expected = expectedStatus(entry.allowed, caller);
      it(`route ${entry.method} ${entry.path} as ${label(caller)} → ${expected}`, async () => {
        const mod = await import(path.join(ROOT, entry.file));
        const handler = mod[entry.method] as (req: unknown, ctx: unknown) => Promise<Response>;
        // DELETE signs the session out, so each call gets a fresh session for the caller.
        const token = caller ? (await import("@/lib/auth/session")).createSession(users[caller].id).then((s) => s.token) : undefined;
        const fixture = entry.setup ? await entry.setup() : {};
        const url = fixture.query ? `${entry.path}?${fixture.query}` : entry.path;
        const response = await handler(
          request(url, { method: entry.method, token: await token, body: fixture.body ?? entry.body }),
          params(fixture.params ?? entry.params ?? {}),
        );
        if (expected === "allowed") expect([401, 403]).not.toContain(response.status);
        else expect(response.status).toBe(expected);
      });
    }
  }
});

describe("cross-origin writes", () => {
  it("a route handler refuses a write whose Origin is another site", async () => {
    const users = await createRoleUsers();
    const { DELETE } = await import("@/app/api/session/route");
    const response = await DELETE(request("/api/session", { method: "DELETE", token: users.admin.token, origin: "http://evil.invalid" }), params({}));
    expect(response.status).toBe(403);
    const missing = await DELETE(request("/api/session", { method: "DELETE", token: users.admin.token, origin: null }), params({}));
    expect(missing.status).toBe(403);
  });
});
