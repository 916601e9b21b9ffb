import { eq, sql } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { sessions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { signInAction } from "@/lib/auth/sign-in";
import { createSession, validateToken } from "@/lib/auth/session";
import { hashToken } from "@/lib/auth/token";
import { changeRoleAction, setActiveAction } from "@/lib/users/actions";
import { createUser, db, TEST_PASSWORD, truncateAll } from "../../support/db";

describe("session lifetime and endings", () => {
  beforeEach(truncateAll);

  it("signing in starts a fresh session and ends the one the browser held before", async () => {
    const me = await createUser("tech", { email: "fixated@rootbench.test" });
    const planted = (await createSession(me.id)).token;
    const result = await executeAction(signInAction, { email: "fixated@rootbench.test", password: TEST_PASSWORD, source: "192.0.2.40", previousToken: planted }, null);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.data.token).not.toBe(planted);
    expect(await validateToken(planted)).toBeNull();
    expect(await validateToken(result.data.token)).not.toBeNull();
  });

  it("a session ends at the absolute lifetime however recently it was used", async () => {
    const me = await createUser("tech");
    const { token } = await createSession(me.id);
    const old = new Date(Date.now() - 31 * 86_400_000);
    await db.update(sessions).set({ createdAt: old, expiresAt: new Date(Date.now() + 10 * 86_400_000) }).where(eq(sessions.id, hashToken(token)));
    expect(await validateToken(token)).toBeNull();
    const [{ n }] = await db.execute<{ n: number }>(sql`select count(*)::int as n from sessions`);
    expect(n).toBe(0);
  });

  it("a role change ends the person's sessions at once", async () => {
    const admin = await createUser("admin");
    const target = await createUser("senior");
    const { token } = await createSession(target.id);
    expect((await executeAction(changeRoleAction, { userId: target.id, role: "trainee" }, admin)).ok).toBe(true);
    expect(await validateToken(token)).toBeNull();
  });

  it("deactivation ends the person's sessions at once", async () => {
    const lead = await createUser("lead");
    const target = await createUser("tech");
    const { token } = await createSession(target.id);
    expect((await executeAction(setActiveAction, { userId: target.id, active: "false" }, lead)).ok).toBe(true);
    expect(await validateToken(token)).toBeNull();
    const [{ n }] = await db.execute<{ n: number }>(sql`select count(*)::int as n from sessions where user_id = ${target.id}`);
    expect(n).toBe(0);
  });
});
