import { availableParallelism } from "node:os";
import { AppError } from "@/lib/errors";

/**
 * A global cap on concurrent password hashing. Each argon2 run takes 19 MiB and tens of
 * milliseconds of a core; without a cap, a burst of sign-in attempts from anywhere takes the
 * memory and the thread pool from everyone else. Beyond the queue the caller gets a 503.
 */
export class HashGate {
  private running = 0;
  private readonly waiting: (() => void)[] = [];

  constructor(readonly limit: number, readonly queueLimit: number) {}

  async run<T>(work: () => Promise<T>): Promise<T> {
    if (this.running >= this.limit) {
      if (this.waiting.length >= this.queueLimit) {
        throw new AppError("unavailable", "The server is busy checking other passwords; try again in a moment.");
      }
      await new Promise<void>((resolve) => this.waiting.push(resolve));
    } else {
      this.running++;
    }
    try {
      return await work();
    } finally {
      const next = this.waiting.shift();
      if (next) next(); // hands its slot on: running stays the same
      else this.running--;
    }
  }

  get busy(): number {
    return this.running;
  }

  get queued(): number {
    return this.waiting.length;
  }
}

const limit = Number(process.env.PASSWORD_HASH_CONCURRENCY) || Math.max(2, Math.min(4, availableParallelism()));
export const passwordHashGate = new HashGate(limit, 64);
