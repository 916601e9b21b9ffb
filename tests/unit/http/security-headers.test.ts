import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, strictTransportSecurity } from "@/lib/http/security-headers";

const directive = (csp: string, name: string) => csp.split(";").map((d) => d.trim()).find((d) => d.startsWith(`${name} `)) ?? "";

describe("Content-Security-Policy", () => {
  it("lets production scripts run only with the response's nonce: no 'unsafe-inline', no eval", () => {
    const scripts = directive(contentSecurityPolicy("abc123", false), "script-src");
    expect(scripts).toContain("'nonce-abc123'");
    expect(scripts).toContain("'strict-dynamic'");
    expect(scripts).not.toContain("'unsafe-inline'");
    expect(scripts).not.toContain("'unsafe-eval'");
  });

  it("forbids framing, plugins and foreign form targets", () => {
    const csp = contentSecurityPolicy("n", false);
    expect(directive(csp, "frame-ancestors")).toBe("frame-ancestors 'none'");
    expect(directive(csp, "object-src")).toBe("object-src 'none'");
    expect(directive(csp, "form-action")).toBe("form-action 'self'");
  });
});

describe("Strict-Transport-Security", () => {
  it("is sent only behind HTTPS (COOKIE_SECURE=1)", () => {
    expect(strictTransportSecurity({ COOKIE_SECURE: "1" } as unknown as NodeJS.ProcessEnv)).toMatch(/^max-age=\d{7,}/);
    expect(strictTransportSecurity({} as unknown as NodeJS.ProcessEnv)).toBeNull();
  });
});
