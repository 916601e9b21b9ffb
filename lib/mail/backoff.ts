/** After this many failed attempts a message stops retrying and shows as failed on /outbox. */
export const MAX_ATTEMPTS = 6;
const BASE_MS = 30_000;
const CAP_MS = 60 * 60_000;

/** Wait before the next try after `attempts` failures: 30 s, 1 min, 2 min, … up to an hour. */
export function retryDelayMs(attempts: number): number {
  return Math.min(CAP_MS, BASE_MS * 2 ** Math.max(0, attempts - 1));
}
