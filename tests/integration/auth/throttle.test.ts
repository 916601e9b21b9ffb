import { beforeEach, describe, expect, it } from "vitest";
import { signInAttempts } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { signInAction } from "@/lib/auth/sign-in";
import { delaySeconds, secondsToWait, THROTTLE } from "@/lib/auth/throttle";
import { countRows, createUser, db, TEST_PASSWORD, truncateAll } from "../../support/db";

const attempt = (email: string, password: string, source: string) => executeAction(signInAction, { email, password, source }, null);

describe("sign-in throttling", () => {
  beforeEach(truncateAll);

  it("delays grow by doubling after the free tries and stop at the cap", () => {
    expect([0, 1, 2, 3, 4, 5, 6].map((n) => delaySeconds(n, 3))).toEqual([0, 0, 0, 1, 2, 4, 8]);
    expect(delaySeconds(100, 3)).toBe(THROTTLE.maxSeconds);
  });

  it("one source guessing one account waits longer after each failure, and waiting attempts cost nothing", async () => {
    await createUser("tech", { email: "target@rootbench.test" });
    for (let i = 0; i < THROTTLE.free.pair; i++) {
      const r = await attempt("target@rootbench.test", `guess-${i}`, "203.0.113.9");
      expect(r.ok || r.status).toBe(401);
    }
    const next = await attempt("target@rootbench.test", "guess-x", "203.0.113.9");
    expect(next.ok).toBe(false);
    if (!next.ok) {
      expect(next.status).toBe(429);
      expect(next.error).toMatch(/Try again in 1 second/);
    }
    // The refused attempt was not recorded (and so not hashed either).
    expect(await countRows("sign_in_attempts")).toBe(THROTTLE.free.pair);
  });

  it("lets the owner in with the right password after others failed from elsewhere", async () => {
    await createUser("lead", { email: "owner@rootbench.test" });
    // The owner signed in from their usual place last week.
    await db.insert(signInAttempts).values({ email: "owner@rootbench.test", succeeded: true, ip: "198.51.100.7", at: new Date(Date.now() - 7 * 86_400_000) });
    // Forty failures from twenty other machines within the last minutes.
    const now = Date.now();
    await db.insert(signInAttempts).values(Array.from({ length: 40 }, (_, i) => ({
      email: "owner@rootbench.test", succeeded: false, ip: `203.0.113.${i % 20}`, at: new Date(now - (40 - i) * 1000),
    })));
    const attacker = await attempt("owner@rootbench.test", "another-guess", "203.0.113.99");
    expect(attacker.ok).toBe(false);
    if (!attacker.ok) expect(attacker.status).toBe(429);
    const owner = await attempt("owner@rootbench.test", TEST_PASSWORD, "198.51.100.7");
    expect(owner.ok, JSON.stringify(owner)).toBe(true);
  });

  it("a source trying many addresses is slowed down across all of them", async () => {
    const now = Date.now();
    await db.insert(signInAttempts).values(Array.from({ length: THROTTLE.free.source + 2 }, (_, i) => ({
      email: `someone-${i}@rootbench.test`, succeeded: false, ip: "203.0.113.50", at: new Date(now - 1000),
    })));
    expect(await secondsToWait(db, "fresh@rootbench.test", "203.0.113.50")).toBeGreaterThan(0);
    expect(await secondsToWait(db, "fresh@rootbench.test", "203.0.113.51")).toBe(0);
  });

  it("answers an unknown address exactly as a wrong password, and counts it the same", async () => {
    await createUser("tech", { email: "real@rootbench.test" });
    const wrong = await attempt("real@rootbench.test", "wrong-password-1", "192.0.2.1");
    const unknown = await attempt("nobody@rootbench.test", "wrong-password-1", "192.0.2.2");
    const pending = await createUser("tech", { email: "pending@rootbench.test" });
    await db.execute((await import("drizzle-orm")).sql`update users set password_hash = '!invited' where id = ${pending.id}`);
    const invited = await attempt("pending@rootbench.test", "wrong-password-1", "192.0.2.3");
    for (const r of [wrong, unknown, invited]) {
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.status).toBe(401);
        expect(r.error).toBe("That e-mail address and password do not match an active account.");
        expect(r.fieldErrors).toEqual({ password: "Check the address and password." });
      }
    }
    expect(await countRows("sign_in_attempts")).toBe(3);
  });
});
