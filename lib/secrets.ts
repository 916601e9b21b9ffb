import "server-only";
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { appSecrets } from "@/db/schema";

const held = new Map<string, Promise<Buffer>>();

/**
 * A secret every app process must agree on: the environment variable when it is set, else a
 * random key stored in PostgreSQL by the first process that asks (the others read the same row).
 * A secret never changes once made, so each process keeps it after the first read.
 */
export function sharedSecret(name: string, envName: string): Promise<Buffer> {
  const configured = process.env[envName];
  if (configured) return Promise.resolve(Buffer.from(configured, "utf8"));
  let secret = held.get(name);
  if (!secret) {
    secret = (async () => {
      await db.insert(appSecrets).values({ name, value: randomBytes(32).toString("base64") }).onConflictDoNothing();
      const [row] = await db.select({ value: appSecrets.value }).from(appSecrets).where(eq(appSecrets.name, name));
      return Buffer.from(row.value, "base64");
    })();
    secret.catch(() => held.delete(name));
    held.set(name, secret);
  }
  return secret;
}
