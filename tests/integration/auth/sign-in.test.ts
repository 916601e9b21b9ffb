import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { sessions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { signInAction } from "@/lib/auth/sign-in";
import { validateToken } from "@/lib/auth/session";
import { hashToken } from "@/lib/auth/token";
import { THROTTLE } from "@/lib/auth/throttle";
import { countRows, createUser, db, TEST_PASSWORD, truncateAll } from "../../support/db";

function form(fields: Record<string, string>): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
}

describe("sign-in", () => {
  beforeEach(truncateAll);

  it("the right password creates a session whose token is stored only as a hash", async () => {
    const user = await createUser("tech", { email: "right@rootbench.test" });
    const result = await executeAction(signInAction, form({ email: "Right@Rootbench.test ", password: TEST_PASSWORD }), null);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const { token, cookie } = result.data;
    expect(cookie.attributes.httpOnly).toBe(true);
    expect(cookie.attributes.sameSite).toBe("lax");
    const rows = await db.select().from(sessions).where(eq(sessions.userId, user.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].id).toBe(hashToken(token));
    expect(rows[0].id).not.toBe(token);
    expect((await validateToken(token))?.user.role).toBe("tech");
  });

  it("a wrong password creates no session and says so", async () => {
    await createUser("tech", { email: "wrong@rootbench.test" });
    const result = await executeAction(signInAction, form({ email: "wrong@rootbench.test", password: "nope-nope" }), null);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(/do not match/);
    expect(await countRows("sessions")).toBe(0);
  });

  it("a deactivated account cannot sign in", async () => {
    await createUser("tech", { email: "gone@rootbench.test", active: false });
    const result = await executeAction(signInAction, form({ email: "gone@rootbench.test", password: TEST_PASSWORD }), null);
    expect(result.ok).toBe(false);
    expect(await countRows("sessions")).toBe(0);
  });

  it("failures older than the window do not lock the account", async () => {
    await createUser("tech", { email: "old@rootbench.test" });
    const { signInAttempts } = await import("@/db/schema");
    const long = new Date(Date.now() - (THROTTLE.windowMinutes + 1) * 60_000);
    await db.insert(signInAttempts).values(Array.from({ length: 40 }, () => ({ email: "old@rootbench.test", succeeded: false, at: long })));
    const r = await executeAction(signInAction, form({ email: "old@rootbench.test", password: TEST_PASSWORD }), null);
    expect(r.ok).toBe(true);
  });

  it("an empty or malformed form gets field messages and writes nothing", async () => {
    const empty = await executeAction(signInAction, form({ email: "", password: "" }), null);
    expect(empty.ok).toBe(false);
    if (!empty.ok) {
      expect(empty.status).toBe(400);
      expect(empty.fieldErrors?.email).toBe("Enter your e-mail address.");
      expect(empty.fieldErrors?.password).toBe("Enter your password.");
    }
    const malformed = await executeAction(signInAction, form({ email: "not-an-address", password: "x" }), null);
    expect(malformed.ok).toBe(false);
    if (!malformed.ok) expect(malformed.fieldErrors?.email).toBe("That is not an e-mail address.");
    expect(await countRows("sign_in_attempts")).toBe(0);
    expect(await countRows("sessions")).toBe(0);
  });
});
