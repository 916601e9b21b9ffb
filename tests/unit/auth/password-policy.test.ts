import { dictionary } from "@zxcvbn-ts/language-common";
import { describe, expect, it } from "vitest";
import { passwordProblem } from "@/lib/auth/password-policy";

describe("password policy", () => {
  it("wants at least 12 characters", () => {
    expect(passwordProblem("short-one-1")).toMatch(/at least 12/);
    expect(passwordProblem("crank gasket ridge")).toBeNull();
  });

  it("refuses every password of 12 or more characters on the shipped common-password list, in any case", () => {
    const long = dictionary["passwords-common"].filter((p) => p.length >= 12);
    expect(long.length).toBeGreaterThan(100);
    for (const p of long) expect(passwordProblem(p), p).toMatch(/common passwords/);
    expect(passwordProblem(long[0].toUpperCase()), long[0]).toMatch(/common passwords/);
  });

  it("refuses the account's own e-mail address", () => {
    expect(passwordProblem("Mechanic.Long@rootbench.test", "mechanic.long@rootbench.test")).toMatch(/e-mail address/);
    expect(passwordProblem("mechanic.long.x", "mechanic.long.x@rootbench.test")).toMatch(/e-mail address/);
  });
});
