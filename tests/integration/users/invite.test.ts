import { eq, sql } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { accountTokens, users } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { lookUpAccountToken } from "@/lib/auth/account-tokens";
import { signInAction } from "@/lib/auth/sign-in";
import { hashToken } from "@/lib/auth/token";
import { inviteUserAction } from "@/lib/users/invite";
import { setPasswordFromLinkAction } from "@/lib/users/password";
import { countRows, createUser, db, truncateAll } from "../../support/db";
import { lastLinkTo } from "./helpers";

const PASSWORD = "gearbox lantern orchard";
const accept = (token: string, password = PASSWORD) =>
  executeAction(setPasswordFromLinkAction, { token, purpose: "invite", password, confirm: password }, null);
const signIn = (email: string, password: string) => executeAction(signInAction, { email, password, source: "192.0.2.20" }, null);

describe("inviting a person by e-mail", () => {
  beforeEach(truncateAll);

  it("queues the invitation in the outbox, stores only the token's hash, and the link sets a password once", async () => {
    process.env.APP_URL = "https://shop.rootbench.test";
    const lead = await createUser("lead");
    const invited = await executeAction(inviteUserAction, { name: "Nia Spoke", email: "Nia.Spoke@rootbench.test", role: "tech" }, lead);
    delete process.env.APP_URL;
    expect(invited.ok, JSON.stringify(invited)).toBe(true);
    expect(await countRows("mail_outbox")).toBe(1);
    const { text, token } = await lastLinkTo("nia.spoke@rootbench.test", "/invite");
    expect(text).toContain("https://shop.rootbench.test/invite?token=");
    expect(text).toMatch(/72 hours/);
    const [stored] = await db.select().from(accountTokens);
    expect(stored.id).toBe(hashToken(token));
    const raw = await db.execute(sql`select count(*)::int as n from account_tokens where id = ${token}`);
    expect(raw[0].n).toBe(0);
    const hours = (stored.expiresAt.getTime() - stored.createdAt.getTime()) / 3_600_000;
    expect(Math.round(hours)).toBe(72);

    // No password yet: nothing signs in.
    expect((await signIn("nia.spoke@rootbench.test", PASSWORD)).ok).toBe(false);

    const first = await accept(token);
    expect(first.ok, JSON.stringify(first)).toBe(true);
    const again = await accept(token, "another long password");
    expect(again.ok).toBe(false);
    if (!again.ok) expect(again.error).toMatch(/used already/);
    expect(await lookUpAccountToken(db, token, "invite")).toEqual({ status: "unknown" });

    const signedIn = await signIn("nia.spoke@rootbench.test", PASSWORD);
    expect(signedIn.ok).toBe(true);
    const [user] = await db.select().from(users).where(eq(users.email, "nia.spoke@rootbench.test"));
    expect(user.role).toBe("tech");
  });

  it("inviting again replaces the link; the old one no longer works", async () => {
    const admin = await createUser("admin");
    await executeAction(inviteUserAction, { name: "Ola Hub", email: "ola@rootbench.test", role: "trainee" }, admin);
    const { token: old } = await lastLinkTo("ola@rootbench.test", "/invite");
    const again = await executeAction(inviteUserAction, { name: "Ola Hub", email: "ola@rootbench.test", role: "tech" }, admin);
    expect(again.ok).toBe(true);
    const { token: fresh } = await lastLinkTo("ola@rootbench.test", "/invite");
    expect(fresh).not.toBe(old);
    expect(await countRows("account_tokens")).toBe(1);
    expect((await accept(old)).ok).toBe(false);
    expect((await accept(fresh)).ok).toBe(true);
    const [user] = await db.select().from(users).where(eq(users.email, "ola@rootbench.test"));
    expect(user.role).toBe("tech");
  });

  it("expired and forged links get a clear refusal and change nothing", async () => {
    const admin = await createUser("admin");
    await executeAction(inviteUserAction, { name: "Pim Axle", email: "pim@rootbench.test", role: "tech" }, admin);
    const { token } = await lastLinkTo("pim@rootbench.test", "/invite");
    await db.update(accountTokens).set({ expiresAt: new Date(Date.now() - 1000) });
    expect(await lookUpAccountToken(db, token, "invite")).toEqual({ status: "expired" });
    const expired = await accept(token);
    expect(expired.ok).toBe(false);
    if (!expired.ok) expect(expired.error).toMatch(/expired/);
    const forged = await accept("A".repeat(43));
    expect(forged.ok).toBe(false);
    if (!forged.ok) expect(forged.error).toMatch(/does not work/);
    // A reset link is not an invitation.
    const wrongKind = await executeAction(setPasswordFromLinkAction, { token, purpose: "reset", password: PASSWORD, confirm: PASSWORD }, null);
    expect(wrongKind.ok).toBe(false);
    const [user] = await db.select().from(users).where(eq(users.email, "pim@rootbench.test"));
    expect(user.passwordHash).toBe("!invited");
  });

  it("refuses an address that already has an account, and a lead handing out the administrator role", async () => {
    const lead = await createUser("lead");
    await createUser("tech", { email: "taken@rootbench.test" });
    const taken = await executeAction(inviteUserAction, { name: "Dup", email: "taken@rootbench.test", role: "tech" }, lead);
    expect(taken.ok).toBe(false);
    if (!taken.ok) expect(taken.status).toBe(409);
    const admin = await executeAction(inviteUserAction, { name: "Boss", email: "boss@rootbench.test", role: "admin" }, lead);
    expect(admin.ok).toBe(false);
    if (!admin.ok) expect(admin.status).toBe(403);
    expect(await countRows("mail_outbox")).toBe(0);
  });
});
