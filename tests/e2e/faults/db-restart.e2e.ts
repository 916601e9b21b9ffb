import { execFile } from "node:child_process";
import { promisify } from "node:util";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, sql } from "@/db";
import { users } from "@/db/schema";
import { auditSteps, runLoad } from "@/scripts/load/walkers";
import { BASE_URL } from "../support/browser";

const ROOT = path.resolve(__dirname, "../../..");

describe("PostgreSQL restarted under load", () => {
  afterAll(async () => { await sql.end({ timeout: 5 }); });

  // The walkers answer through the answerStep server action, posted as the triage screen posts it.
  it("the app recovers by itself and no acknowledged step is lost or duplicated", async () => {
    const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.role, "tech")).limit(1);
    const startedAt = async () => (await sql<{ at: string }[]>`select pg_postmaster_start_time()::text as at`)[0].at;
    const before = await startedAt();
    // Restarted 3 s into the run, without blocking this process: the walkers keep sending meanwhile.
    const restarted = new Promise((resolve) => setTimeout(resolve, 3000)).then(() =>
      promisify(execFile)("bash", ["scripts/db.sh", "restart"], { cwd: ROOT, env: { ...process.env, DB_CLUSTER: "test" } }));
    const result = await runLoad({ baseUrl: BASE_URL, walkers: 6, seconds: 10, maxRequests: 5000, userId: tech.id });
    await restarted;
    // PostgreSQL really went down and came back during the run.
    expect(await startedAt()).not.toBe(before);
    expect(result.ok).toBeGreaterThan(20);

    // After the restart the server answers again within seconds.
    const back = Date.now();
    let healthy = false;
    while (!healthy && Date.now() - back < 15000) {
      healthy = (await fetch(`${BASE_URL}/api/health`).catch(() => null))?.status === 200;
      if (!healthy) await new Promise((r) => setTimeout(r, 250));
    }
    expect(healthy).toBe(true);
    // One healthy answer proves one connection. A pooled connection whose socket closed while the
    // server's event loop was busy can fail its next query once before it reconnects (with the loop
    // free, postgres.js reconnects without a failed query). Within seconds a burst wider than the
    // pool (10) must find every connection working again; later tests rely on it too.
    let healthyBursts = 0;
    while (healthyBursts < 2 && Date.now() - back < 30000) {
      const statuses = await Promise.all(Array.from({ length: 12 }, () => fetch(`${BASE_URL}/api/health`).then((r) => r.status, () => 0)));
      healthyBursts = statuses.every((status) => status === 200) ? healthyBursts + 1 : 0;
      if (healthyBursts < 2) await new Promise((r) => setTimeout(r, 250));
    }
    expect(healthyBursts).toBe(2);

    const audit = await auditSteps(result);
    expect(audit.missing).toBe(0);
    // A step stored without an answer reaching the walker can only come from a request in flight at the restart.
    expect(audit.unacknowledged).toBeLessThanOrEqual(result.failed);
    const dupes = await sql`select case_id, seq, count(*) from case_steps where case_id = any(${result.caseIds}) group by 1, 2 having count(*) > 1`;
    expect(dupes.length).toBe(0);
  });

  // npm test names the processes it started for the browser tests (server, mail worker, fake SMTP).
  it.runIf(process.env.E2E_PROCESS_PIDS)("no process the tests started was brought down by the restart", () => {
    const pids = process.env.E2E_PROCESS_PIDS!.split(" ").filter(Boolean).map(Number);
    expect(pids.length).toBeGreaterThan(0);
    const alive = (pid: number) => { try { process.kill(pid, 0); return true; } catch { return false; } };
    expect(pids.filter((pid) => !alive(pid))).toEqual([]);
  });
});
