import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { sql as pg } from "@/db";
import { users } from "@/db/schema";
import { defineAction, executeAction } from "@/lib/actions/define";
import { logFailure } from "@/lib/log/failure";
import { createUser, db, truncateAll } from "../../support/db";

const SECRET_EMAIL = "private.customer.line@rootbench.test";
const SECRET_HASH = "$argon2id$v=19$m=19456,t=2,p=1$c2VjcmV0c2FsdA$c2VjcmV0aGFzaHZhbHVlaGVyZQ";
const SECRET_PHONE = "+00 555 0199 4711";

// An action whose query fails inside PostgreSQL (the role check constraint) with private values bound.
const failing = defineAction({
  name: "test.failingInsert",
  access: "users:manage",
  input: z.object({}),
  async run() {
    await db.insert(users).values({ id: "leaky", email: SECRET_EMAIL, name: SECRET_PHONE, role: "nobody" as "tech", passwordHash: SECRET_HASH });
    return { id: "leaky" };
  },
});

describe("logging a failed query", () => {
  let logged: string[];
  beforeEach(async () => {
    await truncateAll();
    logged = [];
    vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
      logged.push(args.map((a) => (a instanceof Error ? `${a.message}\n${a.stack}` : typeof a === "string" ? a : JSON.stringify(a))).join(" "));
    });
  });
  afterEach(() => vi.restoreAllMocks());

  it("holds the statement and the SQLSTATE but none of its parameters", async () => {
    const admin = await createUser("admin");
    const result = await executeAction(failing, {}, admin);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.status).toBe(500);
    const text = logged.join("\n");
    expect(text).toMatch(/action test\.failingInsert failed: query failed \(SQLSTATE 23514, constraint users_role_check/);
    expect(text).toMatch(/insert into "users"/);
    for (const secret of [SECRET_EMAIL, SECRET_HASH, SECRET_PHONE, "nobody"]) expect(text).not.toContain(secret);
  });

  it("leaves out the value PostgreSQL quotes in its own message", async () => {
    try {
      await pg`select ${SECRET_PHONE}::int`;
      expect.unreachable();
    } catch (error) {
      expect(String((error as Error).message)).toContain(SECRET_PHONE); // what would have been logged
      logFailure("report failed", error);
    }
    const text = logged.join("\n");
    expect(text).toMatch(/SQLSTATE 22P02/);
    expect(text).not.toContain(SECRET_PHONE);
  });
});
