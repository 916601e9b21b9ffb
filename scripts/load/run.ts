// npm run load: 50 technicians walking cases for 60 s against a production server, answering back
// to back (a stress test: a real shop answers every 30–45 s; LOAD_THINK_MS="min-max" paces them), then /api/health
// under the same concurrency, then the faults: PostgreSQL restarted mid-load, and the SMTP server
// down for a minute while mail is queued. Talks only to 127.0.0.1; every loop is bounded.
import { execFileSync, spawn } from "node:child_process";
import { openSync, writeFileSync } from "node:fs";
import { and, count, eq, inArray } from "drizzle-orm";
import { db, sql } from "@/db";
import { mailOutbox, users } from "@/db/schema";
import { outboxDeliverer } from "@/lib/mail/deliver";
import { startFakeSmtp } from "@/lib/mail/fake-smtp";
import { enqueueMail } from "@/lib/mail/outbox";
import { smtpTransport } from "@/lib/mail/transport";
import { auditSteps, parseThinkTime, percentile, runLoad } from "./walkers";

const baseUrl = process.env.LOAD_BASE_URL ?? "http://127.0.0.1:3300";
const walkers = Number(process.env.LOAD_WALKERS ?? 50);
const seconds = Number(process.env.LOAD_SECONDS ?? 60);
const smtpPort = Number(process.env.LOAD_SMTP_PORT ?? 2727);
const thinkMs = process.env.LOAD_THINK_MS ? parseThinkTime(process.env.LOAD_THINK_MS, { min: 0, max: 0 }) : undefined;

const fmt = (n: number) => n.toFixed(1).padStart(8);

async function healthUnderLoad(secondsToRun: number) {
  const deadline = Date.now() + secondsToRun * 1000;
  const latencies: number[] = [];
  let errors = 0;
  await Promise.all(Array.from({ length: walkers }, async () => {
    while (Date.now() < deadline) {
      const t = performance.now();
      try {
        const r = await fetch(`${baseUrl}/api/health`);
        await r.text();
        if (r.ok) latencies.push(performance.now() - t); else errors++;
      } catch {
        errors++;
      }
    }
  }));
  return { latencies, errors, seconds: secondsToRun };
}

/**
 * Cluster mode (npm run load cluster): the walkers go through HAProxy to two app processes; at
 * LOAD_KILL_AFTER seconds (default 20) the first process is killed with SIGKILL and started again
 * on its port. Every step a walker was told was stored must be in the database exactly once.
 */
async function clusterRun(techId: string) {
  const killPid = Number(process.env.LOAD_KILL_PID);
  const killPort = process.env.LOAD_KILL_PORT!;
  const killAfter = Number(process.env.LOAD_KILL_AFTER ?? 20);
  console.log(`load (cluster): ${walkers} technicians for ${seconds} s through ${baseUrl}; app process ${killPid} killed at ${killAfter} s and restarted`);
  const killer = setTimeout(() => {
    process.kill(-killPid, "SIGKILL");
    const log = openSync(`${process.env.LOAD_LOGS}/app-1-restarted.log`, "a");
    const restarted = spawn("node", ["node_modules/next/dist/bin/next", "start", "-p", killPort, "-H", "127.0.0.1"], {
      detached: true, stdio: ["ignore", log, log], env: { ...process.env, NODE_ENV: "production" },
    });
    writeFileSync(`${process.env.LOAD_LOGS}/restarted.pid`, String(restarted.pid));
    restarted.unref();
    console.log(`  ${new Date().toISOString()} killed ${killPid}, restarted as ${restarted.pid}`);
  }, killAfter * 1000);
  const run = await runLoad({ baseUrl, walkers, seconds, userId: techId });
  clearTimeout(killer);
  const audit = await auditSteps(run);
  const dupes = await sql`select case_id, seq from case_steps where case_id = any(${run.caseIds}) group by 1, 2 having count(*) > 1`;
  console.log("\nphase        requests  errors  steps/s   median ms  p95 ms");
  console.log(`answers     ${String(run.requests).padStart(9)} ${String(run.failed).padStart(7)} ${fmt(run.ok / seconds)} ${fmt(percentile(run.latenciesMs, 50))} ${fmt(percentile(run.latenciesMs, 95))}`);
  console.log(`errors seen by clients: ${JSON.stringify(run.errors)}`);
  console.log(`steps: acknowledged ${run.ackedStepIds.length}, stored ${audit.stored}, missing ${audit.missing}, stored but unacknowledged ${audit.unacknowledged}, stored twice ${dupes.length}`);
  await sql.end({ timeout: 5 });
  if (audit.missing || dupes.length || audit.unacknowledged > run.failed) process.exit(1);
}

async function main() {
  const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.role, "tech")).limit(1);
  if (process.env.LOAD_KILL_PID) return clusterRun(tech.id);
  console.log(`load: ${walkers} technicians for ${seconds} s against ${baseUrl}, ${thinkMs ? `thinking ${thinkMs.min}–${thinkMs.max} ms before each answer` : "answering back to back"}`);

  const steady = await runLoad({ baseUrl, walkers, seconds, userId: tech.id, thinkMs });
  const steadyAudit = await auditSteps(steady);
  const health = await healthUnderLoad(Math.min(20, seconds));
  console.log("\nphase        requests  errors  req/s     median ms  p95 ms");
  console.log(`answers     ${String(steady.requests).padStart(9)} ${String(steady.failed).padStart(7)} ${fmt(steady.ok / seconds)} ${fmt(percentile(steady.latenciesMs, 50))} ${fmt(percentile(steady.latenciesMs, 95))}`);
  console.log(`/api/health ${String(health.latencies.length + health.errors).padStart(9)} ${String(health.errors).padStart(7)} ${fmt(health.latencies.length / health.seconds)} ${fmt(percentile(health.latencies, 50))} ${fmt(percentile(health.latencies, 95))}`);
  console.log(`steps: acknowledged ${steady.ackedStepIds.length}, stored ${steadyAudit.stored}, missing ${steadyAudit.missing}, stored but unacknowledged ${steadyAudit.unacknowledged}`);

  // Fault 1: PostgreSQL restarted in the middle of a 30-second run.
  console.log("\nfault: restarting PostgreSQL 10 s into a 30 s run");
  const restart = setTimeout(() => {
    const t = Date.now();
    execFileSync("bash", ["scripts/db.sh", "restart"], { env: { ...process.env, DB_CLUSTER: "test" }, stdio: "inherit" });
    console.log(`  PostgreSQL back after ${Date.now() - t} ms`);
  }, 10_000);
  const faulted = await runLoad({ baseUrl, walkers: Math.min(walkers, 20), seconds: 30, userId: tech.id });
  clearTimeout(restart);
  const faultAudit = await auditSteps(faulted);
  console.log(`  requests ${faulted.requests}, ok ${faulted.ok}, failed ${faulted.failed} ${JSON.stringify(faulted.errors)}`);
  console.log(`  steps: acknowledged ${faulted.ackedStepIds.length}, stored ${faultAudit.stored}, missing ${faultAudit.missing}, stored but unacknowledged ${faultAudit.unacknowledged}`);

  // Fault 2: the SMTP server down for a minute while 20 messages are queued.
  console.log("\nfault: SMTP down for 60 s with 20 messages queued");
  const transport = smtpTransport({ host: "127.0.0.1", port: smtpPort, secure: false } as Parameters<typeof smtpTransport>[0]);
  const deliverer = outboxDeliverer(transport, { from: "load@example.test" });
  const ids: number[] = [];
  for (let i = 0; i < 20; i++) ids.push(await enqueueMail(db, { to: `load-${i}@example.test`, subject: `Load test ${i}`, text: "Queued during an SMTP outage." }));
  const downUntil = Date.now() + 60_000;
  while (Date.now() < downUntil) {
    await deliverer.deliverDue();
    await new Promise((r) => setTimeout(r, 2000));
  }
  const smtp = await startFakeSmtp({ port: smtpPort, controlPort: null });
  const giveUp = Date.now() + 5 * 60_000;
  while (Date.now() < giveUp && smtp.messages.length < ids.length) {
    await deliverer.deliverDue();
    await new Promise((r) => setTimeout(r, 2000));
  }
  const [{ n: sent }] = await db.select({ n: count() }).from(mailOutbox).where(and(inArray(mailOutbox.id, ids), eq(mailOutbox.status, "sent")));
  console.log(`  delivered after the outage: ${smtp.messages.length} of ${ids.length} (outbox rows marked sent: ${sent})`);
  await smtp.close();
  transport.close();
  await sql.end({ timeout: 5 });
}

main().catch(async (error: unknown) => {
  console.error("load failed:", error);
  await sql.end({ timeout: 5 });
  process.exit(1);
});
