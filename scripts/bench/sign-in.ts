// Sign-in answer times: an unknown address against a known one with the wrong password (they must
// not be told apart), and the right password for scale. Interleaved, each from its own source so
// the throttle stays out of it. `npm run bench sign-in` (needs the seeded bench database).
import { performance } from "node:perf_hooks";
import { db, sql } from "@/db";
import { users } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { hashPassword } from "@/lib/auth/password";
import { signInAction } from "@/lib/auth/sign-in";

const ROUNDS = 60;
const PASSWORD = "bench password for sign-in";
const run = Date.now().toString(36);
// One account per round, so no account collects enough failures to be throttled.
const account = (round: number) => `bench-${run}-${round + 5}@rootbench.test`;
const kinds = {
  "unknown address": (round: number) => ({ email: `nobody-${run}-${round + 5}@rootbench.test`, password: "wrong-password-here" }),
  "wrong password": (round: number) => ({ email: account(round), password: "wrong-password-here" }),
  "right password": (round: number) => ({ email: account(round), password: PASSWORD }),
};

const quantile = (xs: number[], q: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(q * xs.length))];

async function main() {
  const passwordHash = await hashPassword(PASSWORD);
  await db.insert(users).values(Array.from({ length: ROUNDS + 5 }, (_, i) => ({
    id: `bench-${run}-${i}`, email: account(i - 5), name: `Bench ${i}`, role: "tech" as const, passwordHash,
  })));
  const times: Record<string, number[]> = Object.fromEntries(Object.keys(kinds).map((k) => [k, []]));
  let source = 0;
  for (let round = -5; round < ROUNDS; round++) {
    for (const [kind, input] of Object.entries(kinds)) {
      const started = performance.now();
      const result = await executeAction(signInAction, { ...input(round), source: `198.18.${Math.floor(source / 250)}.${source++ % 250}` }, null);
      const ms = performance.now() - started;
      if (result.ok !== (kind === "right password")) throw new Error(`${kind}: unexpected ${JSON.stringify(result).slice(0, 200)}`);
      if (round >= 0) times[kind].push(ms);
    }
  }
  console.log("kind               median ms   p90 ms");
  for (const [kind, xs] of Object.entries(times)) {
    console.log(`${kind.padEnd(18)} ${quantile(xs, 0.5).toFixed(1).padStart(9)} ${quantile(xs, 0.9).toFixed(1).padStart(8)}`);
  }
  const ratio = quantile(times["unknown address"], 0.5) / quantile(times["wrong password"], 0.5);
  console.log(`unknown / wrong-password median: ${ratio.toFixed(2)}`);
}

main().finally(() => sql.end());
