import { describe, expect, it } from "vitest";
import { isSameOrigin } from "@/lib/http/origin";
import { securityHeaders } from "@/lib/http/security-headers";

describe("security headers", () => {
  const headers = Object.fromEntries(securityHeaders().map((h) => [h.key, h.value]));

  it("send a CSP limited to our own origin that forbids framing and plugins", () => {
    const csp = headers["Content-Security-Policy"];
    expect(csp).toMatch(/default-src 'self'/);
    expect(csp).toMatch(/frame-ancestors 'none'/);
    expect(csp).toMatch(/object-src 'none'/);
    expect(csp).not.toMatch(/\*/);
  });

  it("turn off content sniffing and framing", () => {
    expect(headers["X-Content-Type-Options"]).toBe("nosniff");
    expect(headers["X-Frame-Options"]).toBe("DENY");
  });
});

describe("same-origin check for writes", () => {
  const h = (init: Record<string, string>) => new Headers(init);
  it("accepts our own origin and refuses others or none", () => {
    expect(isSameOrigin(h({ host: "shop.test:3000", origin: "http://shop.test:3000" }))).toBe(true);
    expect(isSameOrigin(h({ host: "shop.test:3000", origin: "http://evil.test" }))).toBe(false);
    expect(isSameOrigin(h({ host: "shop.test:3000" }))).toBe(false);
    expect(isSameOrigin(h({ host: "shop.test:3000", origin: "not a url" }))).toBe(false);
  });
});
