import { hash, verify } from "@node-rs/argon2";

// argon2id with the OWASP minimum profile (19 MiB, 2 passes): about 30–60 ms here.
const OPTIONS = { memoryCost: 19456, timeCost: 2, outputLen: 32, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;
/** Spends the same time as a real check, so unknown addresses cannot be told apart by timing. */
export async function verifyAgainstNothing(password: string): Promise<false> {
  dummyHash ??= hashPassword("rootbench-placeholder-password");
  await verifyPassword(await dummyHash, password);
  return false;
}
