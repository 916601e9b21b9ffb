import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { accountTokens, mailOutbox, users } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { signInAction } from "@/lib/auth/sign-in";
import { createSession, validateToken } from "@/lib/auth/session";
import { forceResetAction } from "@/lib/users/actions";
import { changePasswordAction, requestResetAction, setPasswordFromLinkAction, signOutEverywhereAction } from "@/lib/users/password";
import { countRows, createUser, db, TEST_PASSWORD, truncateAll } from "../../support/db";
import { lastLinkTo } from "./helpers";

const NEW = "sprocket meadow twelve";
const signIn = (email: string, password: string) => executeAction(signInAction, { email, password, source: "192.0.2.30" }, null);
const alive = async (tokens: string[]) => Promise.all(tokens.map(async (t) => (await validateToken(t)) !== null));

describe("passwords and sessions", () => {
  beforeEach(truncateAll);

  it("changing one's password needs the current one and ends every other session", async () => {
    const me = await createUser("senior", { email: "me@rootbench.test" });
    const tokens = [(await createSession(me.id)).token, (await createSession(me.id)).token];
    const wrong = await executeAction(changePasswordAction, { current: "not-it-at-all", password: NEW, confirm: NEW }, me);
    expect(wrong.ok).toBe(false);
    expect(await alive(tokens)).toEqual([true, true]);
    const done = await executeAction(changePasswordAction, { current: TEST_PASSWORD, password: NEW, confirm: NEW }, me);
    expect(done.ok, JSON.stringify(done)).toBe(true);
    expect(await alive(tokens)).toEqual([false, false]);
    if (done.ok) expect((await validateToken(done.data.cookie.value))?.user.id).toBe(me.id);
    expect((await signIn("me@rootbench.test", TEST_PASSWORD)).ok).toBe(false);
    expect((await signIn("me@rootbench.test", NEW)).ok).toBe(true);
  });

  it("refuses a new password that breaks the policy", async () => {
    const me = await createUser("tech", { email: "policy.person.long@rootbench.test" });
    for (const [password, pattern] of [["1q2w3e4r5t6y", /common passwords/], ["policy.person.long@rootbench.test", /e-mail address/]] as const) {
      const r = await executeAction(changePasswordAction, { current: TEST_PASSWORD, password, confirm: password }, me);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.fieldErrors?.password).toMatch(pattern);
    }
    const differ = await executeAction(changePasswordAction, { current: TEST_PASSWORD, password: NEW, confirm: `${NEW}x` }, me);
    expect(differ.ok).toBe(false);
    if (!differ.ok) expect(differ.fieldErrors?.confirm).toMatch(/differ/);
  });

  it("a reset request answers the same whether or not the address exists, and mails only real accounts", async () => {
    await createUser("tech", { email: "known@rootbench.test" });
    const known = await executeAction(requestResetAction, { email: "known@rootbench.test" }, null);
    const unknown = await executeAction(requestResetAction, { email: "unknown@rootbench.test" }, null);
    expect(known).toEqual(unknown);
    expect(await countRows("mail_outbox")).toBe(1);
    const [mail] = await db.select().from(mailOutbox);
    expect(mail.toAddress).toBe("known@rootbench.test");
    // A second request within the minute sends nothing more, and still answers the same.
    expect(await executeAction(requestResetAction, { email: "known@rootbench.test" }, null)).toEqual(known);
    expect(await countRows("mail_outbox")).toBe(1);
  });

  it("a reset link works for one hour, once, and ends every session", async () => {
    const me = await createUser("tech", { email: "forgetful@rootbench.test" });
    const session = (await createSession(me.id)).token;
    await executeAction(requestResetAction, { email: "forgetful@rootbench.test" }, null);
    const { token } = await lastLinkTo("forgetful@rootbench.test", "/reset-password");
    const [stored] = await db.select().from(accountTokens);
    expect(Math.round((stored.expiresAt.getTime() - stored.createdAt.getTime()) / 60_000)).toBe(60);
    const set = await executeAction(setPasswordFromLinkAction, { token, purpose: "reset", password: NEW, confirm: NEW }, null);
    expect(set.ok, JSON.stringify(set)).toBe(true);
    expect(await alive([session])).toEqual([false]);
    const twice = await executeAction(setPasswordFromLinkAction, { token, purpose: "reset", password: "yet another password", confirm: "yet another password" }, null);
    expect(twice.ok).toBe(false);
    expect((await signIn("forgetful@rootbench.test", NEW)).ok).toBe(true);
  });

  it("sign out everywhere ends every session of the caller and no one else's", async () => {
    const me = await createUser("trainee");
    const other = await createUser("trainee");
    const mine = [(await createSession(me.id)).token, (await createSession(me.id)).token];
    const theirs = (await createSession(other.id)).token;
    expect((await executeAction(signOutEverywhereAction, {}, me)).ok).toBe(true);
    expect(await alive(mine)).toEqual([false, false]);
    expect(await alive([theirs])).toEqual([true]);
  });

  it("an administrator's forced reset stops the old password, ends sessions and mails a link", async () => {
    const admin = await createUser("admin");
    const lead = await createUser("lead");
    const target = await createUser("tech", { email: "suspect@rootbench.test" });
    const session = (await createSession(target.id)).token;
    const byLead = await executeAction(forceResetAction, { userId: target.id }, lead);
    expect(byLead.ok).toBe(false);
    if (!byLead.ok) expect(byLead.status).toBe(403);
    const done = await executeAction(forceResetAction, { userId: target.id }, admin);
    expect(done.ok, JSON.stringify(done)).toBe(true);
    expect(await alive([session])).toEqual([false]);
    expect((await signIn("suspect@rootbench.test", TEST_PASSWORD)).ok).toBe(false);
    const { token } = await lastLinkTo("suspect@rootbench.test", "/reset-password");
    expect((await executeAction(setPasswordFromLinkAction, { token, purpose: "reset", password: NEW, confirm: NEW }, null)).ok).toBe(true);
    expect((await signIn("suspect@rootbench.test", NEW)).ok).toBe(true);
    const [row] = await db.select().from(users).where(eq(users.id, target.id));
    expect(row.passwordHash.startsWith("$argon2id$")).toBe(true);
  });
});
