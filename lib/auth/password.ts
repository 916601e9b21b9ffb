import { hash, verify } from "@node-rs/argon2";
import { passwordHashGate } from "./hash-gate";

// argon2id with the OWASP minimum profile (19 MiB, 2 passes): about 30–60 ms here.
const OPTIONS = { memoryCost: 19456, timeCost: 2, outputLen: 32, parallelism: 1 } as const;

/**
 * What users.password_hash holds while an account has no password of its own: invited and not yet
 * accepted, or reset by an administrator. Neither is an argon2 hash, so no password matches.
 */
export const NO_PASSWORD = { invited: "!invited", reset: "!reset" } as const;

export function hasOwnPassword(passwordHash: string): boolean {
  return passwordHash.startsWith("$argon2");
}

export function hashPassword(password: string): Promise<string> {
  return passwordHashGate.run(() => hash(password, OPTIONS));
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  if (!hasOwnPassword(passwordHash)) return verifyAgainstNothing(password);
  try {
    return await passwordHashGate.run(() => verify(passwordHash, password));
  } catch (error) {
    if (error instanceof Error && error.name === "AppError") throw error; // the gate's 503
    return false;
  }
}

// A hash of a password no one uses, made with OPTIONS: checking against it costs what a real check costs.
const NOTHING = "$argon2id$v=19$m=19456,t=2,p=1$3nUlFjOc1By6Xh/GZhdPBg$xIYDhgaKRbvNF08YzkWhdUNadZIBs4qMp9SgrkUkp/0";

/** Spends the same time as a real check, so unknown addresses cannot be told apart by timing. */
export async function verifyAgainstNothing(password: string): Promise<false> {
  await passwordHashGate.run(() => verify(NOTHING, password).catch(() => false));
  return false;
}
