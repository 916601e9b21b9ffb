import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/auth/safe-next";

const APP = "https://shop.rootbench.test";

// Forms that browsers (or URL parsers) read as another site or a script; each must end on the app.
const HOSTILE = [
  "//evil.test",
  "///evil.test",
  "/\\evil.test",
  "\\\\evil.test",
  "/\\/evil.test",
  "https://evil.test",
  "http:evil.test",
  "javascript:alert(1)",
  "data:text/html,<script>alert(1)</script>",
  "/\t/evil.test",
  "/%09/evil.test",
  "/\n/evil.test",
  "/%0a/evil.test",
  "/%0d%0a/evil.test",
  "%2F%2Fevil.test",
  "/%2F/evil.test",
  "/%5Cevil.test",
  "/%5C%5Cevil.test",
  "/..//evil.test",
  "/.//evil.test",
  "/%2e%2e//evil.test",
  " //evil.test",
  "\u0000//evil.test",
  "/\u0000/evil.test",
  "https:/\\evil.test",
  "evil.test",
  "@evil.test",
  "",
  "/" + "a".repeat(600),
];

/** Where a browser on the app would go with Location set to `path`. */
const landsOn = (path: string) => new URL(path, APP);

describe("the next parameter after sign-in", () => {
  it(`keeps every one of ${HOSTILE.length} hostile forms on the app's origin`, () => {
    expect(HOSTILE.length).toBeGreaterThanOrEqual(15);
    for (const value of HOSTILE) {
      const path = safeNextPath(value);
      expect(path.startsWith("/"), JSON.stringify(value)).toBe(true);
      expect(path.startsWith("//"), JSON.stringify(value)).toBe(false);
      expect(path, JSON.stringify(value)).not.toMatch(/[\\\u0000-\u001f]/);
      expect(landsOn(path).origin, JSON.stringify(value)).toBe(APP);
    }
  });

  it("keeps ordinary paths of the app, with their query and fragment", () => {
    expect(safeNextPath("/cases?status=open&page=2")).toBe("/cases?status=open&page=2");
    expect(safeNextPath("/writeups/owc-cage#photos")).toBe("/writeups/owc-cage#photos");
    expect(safeNextPath("/triage/new")).toBe("/triage/new");
  });

  it("falls back to the home page for anything that is not a string", () => {
    expect(safeNextPath(undefined)).toBe("/");
    expect(safeNextPath(["/cases"])).toBe("/");
  });
});
