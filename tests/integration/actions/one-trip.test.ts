import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { defineAction, type OneTripDone } from "@/lib/actions/define";
import { tryInOneTrip } from "@/lib/actions/one-trip";
import type { CallerCheck } from "@/lib/auth/caller-check";
import { CAPABILITIES } from "@/lib/auth/roles";
import { hashToken } from "@/lib/auth/token";

const DAY = 24 * 60 * 60 * 1000;

function specWith(inOneTrip: (input: { n: number }, caller: CallerCheck) => Promise<OneTripDone<string> | null>, access: "case:work" | "public" = "case:work") {
  return defineAction({ name: "test.one-trip", access, input: z.object({ n: z.coerce.number().int() }), run: async () => "ordinary", inOneTrip });
}

describe("tryInOneTrip", () => {
  it("hands the parsed input and the caller check (hashed token, the capability's roles) to the action", async () => {
    const inOneTrip = vi.fn(async () => ({ value: "quick", sessionExpiresAt: new Date(Date.now() + 13 * DAY) }));
    const outcome = await tryInOneTrip(specWith(inOneTrip), { n: "7" }, "token-1");
    expect(inOneTrip).toHaveBeenCalledWith({ n: 7 }, { sessionId: hashToken("token-1"), roles: CAPABILITIES["case:work"] });
    expect(outcome).toEqual({ result: { ok: true, data: "quick" }, extendSession: false });
  });

  it("does not call the action without a token, with an absurd token, with bad input or on a public action", async () => {
    const inOneTrip = vi.fn(async () => ({ value: "quick", sessionExpiresAt: new Date() }));
    expect(await tryInOneTrip(specWith(inOneTrip), { n: 1 }, undefined)).toBeNull();
    expect(await tryInOneTrip(specWith(inOneTrip), { n: 1 }, "x".repeat(201))).toBeNull();
    expect(await tryInOneTrip(specWith(inOneTrip), { n: "one" }, "token-1")).toBeNull();
    expect(await tryInOneTrip(specWith(inOneTrip, "public"), { n: 1 }, "token-1")).toBeNull();
    expect(inOneTrip).not.toHaveBeenCalled();
  });

  it("a null or a thrown error leaves it to the ordinary path; the error is logged", async () => {
    expect(await tryInOneTrip(specWith(async () => null), { n: 1 }, "token-1")).toBeNull();
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    expect(await tryInOneTrip(specWith(async () => { throw new Error("boom"); }), { n: 1 }, "token-1")).toBeNull();
    expect(log).toHaveBeenCalledOnce();
    log.mockRestore();
  });

  it("asks for the session to be extended once less than half of its 14 days is left", async () => {
    const at = (days: number) => specWith(async () => ({ value: "quick", sessionExpiresAt: new Date(Date.now() + days * DAY) }));
    expect((await tryInOneTrip(at(6.9), { n: 1 }, "t"))?.extendSession).toBe(true);
    expect((await tryInOneTrip(at(7.1), { n: 1 }, "t"))?.extendSession).toBe(false);
  });
});
