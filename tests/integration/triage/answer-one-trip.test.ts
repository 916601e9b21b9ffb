import { asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { cases, caseSteps, sessions, users } from "@/db/schema";
import { executeAction, type ActionResult } from "@/lib/actions/define";
import { tryInOneTrip } from "@/lib/actions/one-trip";
import { ALL_ROLES, may, type Role } from "@/lib/auth/roles";
import { createSession, validateToken } from "@/lib/auth/session";
import { hashToken } from "@/lib/auth/token";
import { answerStepAction, type AnsweredStep } from "@/lib/triage/answer";
import { familyHistory } from "@/lib/triage/history";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { scoreCauses } from "@/lib/diagnosis";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { createUser, db } from "../../support/db";
import { idsOf, pedalSlipCase } from "./helpers";

const DAY = 24 * 60 * 60 * 1000;

/** What runAction does with the request's cookie, minus the cookie jar. */
async function answerAs(token: string | undefined, input: Record<string, unknown>): Promise<{ quick: boolean; result: ActionResult<AnsweredStep> }> {
  const quick = await tryInOneTrip(answerStepAction, input, token);
  if (quick) return { quick: true, result: quick.result };
  return { quick: false, result: await executeAction(answerStepAction, input, (await validateToken(token))?.user ?? null) };
}

// The triage screen's answer goes in one round trip: the step insert itself checks the session
// and the role. It must let in exactly whom the ordinary path lets in, and write nothing otherwise.
describe("the answer action in one trip", () => {
  const c = pedalSlipCase();
  const steps = () => db.select().from(caseSteps).where(eq(caseSteps.caseId, c.caseId)).orderBy(asc(caseSteps.seq));
  const input = async (nodeKey = "q-what", label = "Pedals spin forward") => {
    const ids = await idsOf(c.versionId, nodeKey, label);
    return { caseId: c.caseId, nodeId: ids.nodeId, optionId: ids.optionId };
  };

  it("a technician's answer is stored in one trip, by them, with the ranking the engine gives", async () => {
    const { quick, result } = await answerAs(c.token, await input());
    expect(quick).toBe(true);
    expect(result.ok).toBe(true);
    const [step] = await steps();
    expect(step.answeredBy).toBe(c.tech.id);
    const [kase] = await db.select().from(cases).where(eq(cases.id, c.caseId));
    const dx = toDxTree((await loadGraph(c.versionId))!);
    const expected = scoreCauses(dx, [{ nodeId: "q-what", optionId: (await idsOf(c.versionId, "q-what", "Pedals spin forward")).optionKey }], { history: await familyHistory(kase.familyId) });
    expect((step.ranking as StoredRanking).causes).toEqual(expected.causes);
    if (result.ok) expect(result.data.ranking).toEqual(step.ranking);
  });

  for (const role of ALL_ROLES) {
    const allowed = may(role, "case:work");
    it(`as ${role}: ${allowed ? "stored in one trip" : "nothing in one trip, 403 from the ordinary path, nothing written"}`, async () => {
      const user = await createUser(role as Role);
      const { token } = await createSession(user.id);
      const { quick, result } = await answerAs(token, await input());
      expect(quick).toBe(allowed);
      if (allowed) {
        expect((await steps()).map((s) => s.answeredBy)).toEqual([user.id]);
      } else {
        expect(!result.ok && result.status).toBe(403);
        expect(await steps()).toEqual([]);
      }
    });
  }

  it("no cookie, a made-up token, an expired session or a deactivated user: 401 and nothing written", async () => {
    const expiredUser = await createUser("tech");
    const expired = await createSession(expiredUser.id);
    await db.update(sessions).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(sessions.id, hashToken(expired.token)));
    const inactiveUser = await createUser("tech");
    const inactive = await createSession(inactiveUser.id);
    await db.update(users).set({ active: false }).where(eq(users.id, inactiveUser.id));
    for (const token of [undefined, "not-a-session-token", expired.token, inactive.token]) {
      const { quick, result } = await answerAs(token, await input());
      expect(quick).toBe(false);
      expect(!result.ok && result.status).toBe(401);
    }
    expect(await steps()).toEqual([]);
  });

  it("a session past half its 14 days is flagged for extending, as lucia would; a newer one is not", async () => {
    const user = await createUser("tech");
    const { token } = await createSession(user.id);
    await db.update(sessions).set({ expiresAt: new Date(Date.now() + 3 * DAY) }).where(eq(sessions.id, hashToken(token)));
    const old = await tryInOneTrip(answerStepAction, await input(), token);
    expect(old?.extendSession).toBe(true);
    await db.update(sessions).set({ expiresAt: new Date(Date.now() + 10 * DAY) }).where(eq(sessions.id, hashToken(token)));
    const fresh = await tryInOneTrip(answerStepAction, await input("q-onset", "Suddenly"), token);
    expect(fresh?.extendSession).toBe(false);
  });

  it("bad input or a closed case: nothing in one trip, the ordinary path's clear error, nothing written", async () => {
    const own = await input();
    const other = await idsOf(c.versionId, "q-onset", "Suddenly");
    const cases_: [Record<string, unknown>, number][] = [
      [{ ...own, optionId: 999999 }, 422],
      [{ ...own, optionId: other.optionId }, 422],
      [{ ...own, caseId: 999999 }, 404],
      [{ ...own, nodeId: "one" }, 400],
    ];
    for (const [bad, status] of cases_) {
      const { quick, result } = await answerAs(c.token, bad);
      expect(quick).toBe(false);
      expect(!result.ok && result.status, JSON.stringify(bad)).toBe(status);
    }
    await db.update(cases).set({ status: "closed", closedAt: new Date() }).where(eq(cases.id, c.caseId));
    const closed = await answerAs(c.token, own);
    expect(closed.quick).toBe(false);
    expect(!closed.result.ok && closed.result.status).toBe(409);
    expect(await steps()).toEqual([]);
  });

  it("a step removed behind the remembered case's back: the one trip refuses, the ordinary path lands the answer after what is stored", async () => {
    await answerAs(c.token, await input());
    await answerAs(c.token, await input("q-onset", "Suddenly"));
    await db.delete(caseSteps).where(eq(caseSteps.caseId, c.caseId)); // as another server process's undo would, twice
    const { quick, result } = await answerAs(c.token, await input("q-cold", "No difference"));
    expect(quick).toBe(false);
    expect(result.ok).toBe(true);
    expect((await steps()).map((s) => s.seq)).toEqual([1]);
  });
});
