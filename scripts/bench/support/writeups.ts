// The benchmarks' generated write-ups: BENCH_WRITEUPS (default 10,000) published write-ups
// recombined from the demo write-ups' own sentences, headings, titles and tags, so their words
// occur about as often as in the shop's real writing.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { like } from "drizzle-orm";
import { db, sql as pg } from "../../../db";
import { writeupCauses, writeupFamilies, writeupParts, writeups } from "../../../db/schema";
import { parseWriteup } from "../../../db/seed/content";
import { prng } from "@/lib/random";

export const COUNT = Number(process.env.BENCH_WRITEUPS ?? 10_000);
const PREFIX = "bench-gen-";
const ROOT = path.resolve(__dirname, "../../..");

export const removeGenerated = () => db.delete(writeups).where(like(writeups.slug, `${PREFIX}%`));

interface Pools { titles: string[]; summaries: string[]; headings: string[]; sentences: string[]; tags: string[] }

function demoPools(): Pools {
  const dir = path.join(ROOT, "content/writeups");
  const pools: Pools = { titles: [], summaries: [], headings: [], sentences: [], tags: [] };
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".md"))) {
    const w = parseWriteup(file.replace(/\.md$/, ""), readFileSync(path.join(dir, file), "utf8"));
    pools.titles.push(w.title.includes(": ") ? w.title.split(": ").slice(1).join(": ") : w.title);
    pools.summaries.push(w.summary);
    pools.tags.push(...w.tags);
    for (const line of w.body.split("\n").map((l) => l.trim())) {
      if (/^#{2,3} /.test(line)) pools.headings.push(line.replace(/^#+ /, ""));
      else if (line && !/^(\||!\[|```|>)/.test(line)) pools.sentences.push(...line.replace(/^([-*]|\d+\.) /, "").split(/(?<=[.!?])\s+/).filter((x) => x.length > 20));
    }
  }
  return pools;
}

// Typed in the benchmark: words a trainee would look for, as every prefix from three letters on.
export const WORDS = ["bearing", "clutch", "sprag", "corrosion", "controller", "water", "belt", "torque", "sensor", "grease", "seal", "pedal", "crank", "needle", "gear", "washer", "magnet", "cadence", "connector", "tensioner", "housing", "gasket", "rollers", "membrane", "firmware", "cage", "shaft", "spider", "lockring", "winter",
  "pressure", "display", "cable", "pulley", "rotor", "battery", "vent", "bolts", "salt", "rust", "flank", "depth", "press", "thread",
  "speed", "stethoscope", "calibration", "commuter", "cargo", "trail", "crack", "whine", "grinding"];

interface Catalogue { families: { id: number; label: string }[]; causes: { id: number; name: string }[]; parts: { id: number }[]; userId: string | null }

function generate(i: number, random: () => number, cat: Catalogue, pools: Pools) {
  const pick = <T,>(items: T[]) => items[Math.floor(random() * items.length)];
  const sentences = (n: number) => Array.from({ length: n }, () => pick(pools.sentences)).join(" ");
  const family = pick(cat.families);
  const sections = Array.from({ length: 4 + Math.floor(random() * 2) }, (_, k) =>
    k === 2
      ? [`## ${pick(pools.headings)}`, "", ...Array.from({ length: 3 }, () => `- ${pick(pools.sentences)}`)].join("\n")
      : [`## ${pick(pools.headings)}`, "", sentences(2 + Math.floor(random() * 3))].join("\n"));
  return {
    row: {
      slug: `${PREFIX}${i}`, title: `${family.label}: ${pick(pools.titles)}`, summary: pick(pools.summaries),
      body: sections.join("\n\n"), tags: [...new Set([pick(pools.tags), pick(pools.tags)])],
    },
    familyId: family.id, causeId: pick(cat.causes).id, partId: pick(cat.parts).id,
  };
}

export async function generateWriteups(): Promise<void> {
  const families = await pg<{ id: number; label: string }[]>`select id, name || ' ' || generation as label from motor_families`;
  const causes = await pg<{ id: number; name: string }[]>`select id, name from causes`;
  const parts = await pg<{ id: number }[]>`select id from parts`;
  const [author] = await pg<{ id: string }[]>`select id from users where role = 'senior' limit 1`;
  const cat: Catalogue = { families, causes, parts, userId: author?.id ?? null };
  const pools = demoPools();
  const random = prng(20260101);
  const started = Date.now();
  for (let from = 0; from < COUNT; from += 1000) {
    const batch = Array.from({ length: Math.min(1000, COUNT - from) }, (_, k) => generate(from + k, random, cat, pools));
    const at = new Date();
    const ids = await db
      .insert(writeups)
      .values(batch.map((b) => ({ ...b.row, status: "published" as const, authorId: cat.userId, publishedAt: at, publishedBy: cat.userId, updatedAt: at })))
      .returning({ id: writeups.id });
    await db.insert(writeupFamilies).values(batch.map((b, k) => ({ writeupId: ids[k].id, familyId: b.familyId })));
    await db.insert(writeupCauses).values(batch.map((b, k) => ({ writeupId: ids[k].id, causeId: b.causeId })));
    await db.insert(writeupParts).values(batch.map((b, k) => ({ writeupId: ids[k].id, partId: b.partId })));
  }
  console.log(`generated ${COUNT} write-ups in ${Date.now() - started} ms`);
}
