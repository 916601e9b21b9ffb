import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { users } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { createSession, validateToken } from "@/lib/auth/session";
import { setThemeAction } from "@/lib/users/theme";
import { createUser, db, truncateAll } from "../../support/db";

const themeOf = async (id: string) => (await db.select({ theme: users.theme }).from(users).where(eq(users.id, id)))[0]?.theme;

describe("the dark workshop theme, kept with the account", () => {
  beforeEach(truncateAll);

  it("a new account starts light; choosing dark is stored and comes back with the session", async () => {
    const tech = await createUser("tech");
    const other = await createUser("senior");
    const { token } = await createSession(tech.id);
    expect((await validateToken(token))?.theme).toBe("light");

    const result = await executeAction(setThemeAction, { theme: "dark" }, tech);
    expect(result.ok).toBe(true);
    expect(await themeOf(tech.id)).toBe("dark");
    expect((await validateToken(token))?.theme).toBe("dark");
    expect(await themeOf(other.id), "only the caller's own account changes").toBe("light");

    expect((await executeAction(setThemeAction, { theme: "light" }, tech)).ok).toBe(true);
    expect(await themeOf(tech.id)).toBe("light");
  });

  it("an unknown theme gets a clear message and changes nothing", async () => {
    const trainee = await createUser("trainee");
    const result = await executeAction(setThemeAction, { theme: "neon" }, trainee);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.status).toBe(400);
      expect(result.fieldErrors?.theme).toMatch(/light or the dark/);
    }
    expect(await themeOf(trainee.id)).toBe("light");
  });

  it("refuses a visitor who is not signed in", async () => {
    const result = await executeAction(setThemeAction, { theme: "dark" }, null);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.status).toBe(401);
  });

  it("the database refuses a theme outside the list", async () => {
    const tech = await createUser("tech");
    await expect(db.update(users).set({ theme: "neon" as "dark" }).where(eq(users.id, tech.id))).rejects.toThrow();
    expect(await themeOf(tech.id)).toBe("light");
  });
});
