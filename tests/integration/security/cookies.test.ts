import { afterEach, describe, expect, it, vi } from "vitest";

describe("session cookie flags", () => {
  afterEach(() => {
    delete process.env.COOKIE_SECURE;
    vi.resetModules();
  });

  it("is HttpOnly and SameSite=Lax, and not Secure on plain HTTP", async () => {
    const { lucia } = await import("@/lib/auth/lucia");
    const cookie = lucia.createSessionCookie("token");
    expect(cookie.attributes.httpOnly).toBe(true);
    expect(cookie.attributes.sameSite).toBe("lax");
    expect(cookie.attributes.secure).toBe(false);
    expect(cookie.serialize()).toMatch(/HttpOnly/);
  });

  it("is Secure when the install runs behind HTTPS (COOKIE_SECURE=1)", async () => {
    process.env.COOKIE_SECURE = "1";
    vi.resetModules();
    const { lucia } = await import("@/lib/auth/lucia");
    const cookie = lucia.createSessionCookie("token");
    expect(cookie.attributes.secure).toBe(true);
    expect(cookie.serialize()).toMatch(/Secure/);
  });
});
