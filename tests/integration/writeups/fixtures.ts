import { mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { asc } from "drizzle-orm";
import { causes, motorFamilies, parts } from "@/db/schema";
import { db } from "../../support/db";

/** A private upload folder for this test file (the seed stores the demo drawings there). */
export function useTemporaryUploads(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), "rootbench-writeup-uploads-"));
  process.env.UPLOAD_DIR = dir;
  return dir;
}

export async function catalogueIds() {
  const [f, c, p] = await Promise.all([
    db.select({ id: motorFamilies.id }).from(motorFamilies).orderBy(asc(motorFamilies.id)).limit(2),
    db.select({ id: causes.id }).from(causes).orderBy(asc(causes.id)).limit(2),
    db.select({ id: parts.id }).from(parts).orderBy(asc(parts.id)).limit(2),
  ]);
  return { families: f.map((r) => r.id), causes: c.map((r) => r.id), parts: p.map((r) => r.id) };
}

export function draftInput(ids: Awaited<ReturnType<typeof catalogueIds>>, extra: Record<string, unknown> = {}) {
  return {
    title: "Belt chirp on cold mornings",
    summary: "A chirp from the belt drive below five degrees that went once the unit warmed up.",
    body: "## Reported\n\nA chirp at every pedal stroke on cold mornings.\n\n## Found\n\nThe belt had glazed on one flank.",
    familyIds: [String(ids.families[0])],
    causeIds: [String(ids.causes[0])],
    partIds: [String(ids.parts[0])],
    tags: "belt, Cold , belt",
    intent: "draft",
    ...extra,
  };
}
