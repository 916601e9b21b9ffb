/**
 * Demo mode (the default): the invented workshop with its shared demo password is seeded and the
 * local fake SMTP server catches mail. ROOTBENCH_DEMO=0 is a shop of its own: no demo data, no
 * account until /setup creates the first administrator.
 */
export function isDemoMode(env: NodeJS.ProcessEnv = process.env): boolean {
  return env.ROOTBENCH_DEMO !== "0";
}
