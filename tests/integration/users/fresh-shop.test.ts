import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "@/db/seed/accounts";
import { seed } from "@/db/seed";
import { executeAction } from "@/lib/actions/define";
import { signInAction } from "@/lib/auth/sign-in";
import { validateToken } from "@/lib/auth/session";
import { setupAction, setupOpen } from "@/lib/users/setup";
import { countRows, createUser, db, truncateAll } from "../../support/db";

const PASSWORD = "copper winding ninety";
const setup = (email: string, password = PASSWORD) =>
  executeAction(setupAction, { name: "Shop Owner", email, password, confirm: password, shopName: "Lantern Lane Drive Repairs", shopEmail: "desk@lantern-lane.rootbench.test" }, null);

describe("a shop of its own (ROOTBENCH_DEMO=0)", () => {
  beforeEach(async () => {
    process.env.ROOTBENCH_DEMO = "0";
    await truncateAll();
  });
  afterEach(() => {
    delete process.env.ROOTBENCH_DEMO;
  });

  it("gets no demo data, and no demo address signs in with the demo password", async () => {
    expect(await seed()).toBe("not-demo");
    expect(await seed({ force: true })).toBe("not-demo");
    expect(await countRows("users")).toBe(0);
    expect(await countRows("trees")).toBe(0);
    for (const account of DEMO_ACCOUNTS) {
      const result = await executeAction(signInAction, { email: account.email, password: DEMO_PASSWORD, source: "192.0.2.10" }, null);
      expect(result.ok, account.email).toBe(false);
      if (!result.ok) expect(result.status).toBe(401);
    }
    expect(await countRows("sessions")).toBe(0);
  });

  it("/setup creates exactly one administrator, signed in, and then closes for good", async () => {
    expect(await setupOpen()).toBe(true);
    const first = await setup("owner@rootbench.test");
    expect(first.ok, JSON.stringify(first)).toBe(true);
    if (!first.ok) return;
    const session = await validateToken(first.data.cookie.value);
    expect(session?.user).toMatchObject({ email: "owner@rootbench.test", role: "admin" });
    const { loadShop } = await import("@/lib/cases/shop");
    expect(await loadShop()).toMatchObject({ name: "Lantern Lane Drive Repairs", email: "desk@lantern-lane.rootbench.test" });
    expect(await setupOpen()).toBe(false);
    const second = await setup("intruder@rootbench.test");
    expect(second.ok).toBe(false);
    if (!second.ok) {
      expect(second.status).toBe(409);
      expect(second.error).toMatch(/set up already/);
    }
    expect(await countRows("users")).toBe(1);
  });

  it("of many setups racing, exactly one succeeds", async () => {
    const results = await Promise.all(Array.from({ length: 6 }, (_, i) => setup(`racer-${i}@rootbench.test`)));
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    for (const r of results.filter((r) => !r.ok)) if (!r.ok) expect(r.status).toBe(409);
    expect(await countRows("users")).toBe(1);
    const [{ role }] = await db.execute<{ role: string }>((await import("drizzle-orm")).sql`select role from users`);
    expect(role).toBe("admin");
  });

  it("stays closed even if every account is later removed", async () => {
    expect((await setup("owner@rootbench.test")).ok).toBe(true);
    await db.execute((await import("drizzle-orm")).sql`delete from users`);
    const again = await setup("late@rootbench.test");
    expect(again.ok).toBe(false);
    expect(await countRows("users")).toBe(0);
  });

  it("holds the first administrator's password to the policy", async () => {
    const common = await setup("owner@rootbench.test", "1qaz2wsx3edc");
    expect(common.ok).toBe(false);
    if (!common.ok) expect(common.fieldErrors?.password).toMatch(/common passwords/);
    const own = await setup("owner.long.address@rootbench.test", "owner.long.address@rootbench.test");
    expect(own.ok).toBe(false);
    if (!own.ok) expect(own.fieldErrors?.password).toMatch(/e-mail address/);
    const short = await setup("owner@rootbench.test", "short-pass");
    expect(short.ok).toBe(false);
    if (!short.ok) expect(short.status).toBe(400);
    expect(await countRows("users")).toBe(0);
  });
});

describe("demo seeding", () => {
  beforeEach(truncateAll);

  it("never seeds a database that holds real accounts, even when forced", async () => {
    await createUser("admin", { email: "real.owner@rootbench.test" });
    expect(await seed({ force: true, history: false })).toBe("skipped");
    expect(await countRows("users")).toBe(1);
    expect(await countRows("trees")).toBe(0);
  });

  it("the demo workshop's setup page is closed", async () => {
    expect(await seed({ history: false })).toBe("seeded");
    expect(await setupOpen()).toBe(false);
  });
});
