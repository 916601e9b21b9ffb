// Server-side only: reads the demo content from disk with node:fs (used by the seed and tests).
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import matter from "gray-matter";
import { z } from "zod";
import { ROLES } from "@/lib/auth/roles";
import { slugSchema, strengthSchema, treeFileSchema, type TreeFile } from "@/lib/trees/file/schema";

export const roleSchema = z.enum(ROLES);

export const workshopSchema = z.strictObject({
  name: z.string().min(1),
  town: z.string().min(1),
  currency: z.literal("EUR"),
  phone: z.string().regex(/^\+00[\d ]+$/, "a fictional +00 number"),
  email: z.email().refine((e) => e.endsWith(".example.test") || e.endsWith("@example.test"), "must be at example.test"),
  openingHours: z.string().min(1),
  staff: z.array(z.strictObject({ role: roleSchema, name: z.string().min(1), email: z.email() })).length(5),
});
export type Workshop = z.infer<typeof workshopSchema>;

export const familySchema = z.strictObject({
  slug: slugSchema,
  name: z.string().min(1),
  generation: z.string().min(1),
  years: z.string().regex(/^\d{4}–\d{4}$/, "like 2019–2022, with an en dash"),
  notes: z.string().min(1),
});
export const makerSchema = z.strictObject({
  slug: slugSchema,
  name: z.string().min(1),
  blurb: z.string().min(1),
  families: z.array(familySchema).min(1),
});
export type Maker = z.infer<typeof makerSchema>;
export type MotorFamily = z.infer<typeof familySchema> & { maker: string };

export const partSchema = z.strictObject({
  slug: slugSchema,
  name: z.string().min(1),
  sku: z.string().regex(/^RB-[A-Z0-9]+-[A-Z0-9]+$/),
  unitPriceEur: z.number().nonnegative(),
});
export type Part = z.infer<typeof partSchema>;

export const causeAreaSchema = z.enum(["clutch", "bearing", "seal", "drive_train", "sensor", "electronics", "cable", "firmware", "housing"]);

export const causeSchema = z
  .strictObject({
    slug: slugSchema,
    name: z.string().min(1),
    area: causeAreaSchema,
    description: z.string().min(1),
    inspectMinutes: z.number().positive(),
    labourMinutes: z.number().positive(),
    priceLowEur: z.number().nonnegative(),
    priceHighEur: z.number().nonnegative(),
    parts: z.array(z.strictObject({ part: slugSchema, quantity: z.number().int().positive() })),
    /** A trade rating carried with the cause, e.g. a one-way clutch's torque rating. */
    ratingNm: z.number().positive().optional(),
  })
  .refine((c) => c.priceLowEur <= c.priceHighEur, { message: "priceLowEur must not exceed priceHighEur" });
export type Cause = z.infer<typeof causeSchema>;

const share = z.number().min(0).max(1);
const ridingUseSchema = z.strictObject({ road: share, trail: share, cargo: share, commuting: share });
const month = z.number().int().min(1).max(12);

export const scenarioSchema = z.strictObject({
  format: z.literal("rootbench-scenario"),
  formatVersion: z.literal(1),
  notes: z.string(),
  seed: z.number().int(),
  months: z.number().int().positive(),
  closedCases: z.number().int().positive(),
  openCasesPerStatus: z.number().int().nonnegative(),
  callerMix: z.strictObject({ rider: share, dealer: share }),
  answerNoise: share,
  dontKnowRate: share,
  secondCauseRate: share,
  families: z.record(
    slugSchema,
    z.strictObject({ caseShare: share, ridingUse: ridingUseSchema, causeRates: z.record(slugSchema, z.number().nonnegative()) }),
  ),
  ridingUseFactors: z.partialRecord(z.enum(["road", "trail", "cargo", "commuting"]), z.record(slugSchema, z.number().positive())),
  water: z.strictObject({ causes: z.array(slugSchema), wetMonths: z.array(month), boost: z.number().min(1) }),
  symptomShare: z.record(slugSchema, share),
  misweighted: z.array(
    z.strictObject({ tree: slugSchema, option: slugSchema, cause: slugSchema, authored: strengthSchema, actual: strengthSchema, why: z.string() }),
  ),
});
export type Scenario = z.infer<typeof scenarioSchema>;

// YAML turns an unquoted 2025-03-14 into a Date; accept both and keep the ISO day.
const isoDay = z.preprocess(
  (v) => (v instanceof Date ? v.toISOString().slice(0, 10) : v),
  z.string().regex(/^\d{4}-\d{2}-\d{2}$/),
);

export const writeupFrontMatterSchema = z.strictObject({
  title: z.string().min(1),
  summary: z.string().min(1),
  families: z.array(slugSchema),
  causes: z.array(slugSchema),
  parts: z.array(slugSchema).default([]),
  tags: z.array(z.string().min(1)).default([]),
  author: roleSchema,
  status: z.enum(["draft", "published"]),
  date: isoDay,
  photos: z.array(z.string().regex(/^[a-z0-9-]+\.(svg|png|jpg)$/)).default([]),
});
export type WriteupFrontMatter = z.infer<typeof writeupFrontMatterSchema>;
export type Writeup = WriteupFrontMatter & { slug: string; body: string };

export interface Content {
  workshop: Workshop;
  makers: Maker[];
  families: MotorFamily[];
  parts: Part[];
  causes: Cause[];
  trees: TreeFile[];
  scenario: Scenario;
  writeups: Writeup[];
}

function readJson<T>(file: string, schema: z.ZodType<T>): T {
  const parsed = schema.safeParse(JSON.parse(readFileSync(file, "utf8")));
  if (!parsed.success) throw new Error(`${file}: ${z.prettifyError(parsed.error)}`);
  return parsed.data;
}

function filesIn(dir: string, ext: string): string[] {
  return existsSync(dir) ? readdirSync(dir).filter((f) => f.endsWith(ext)).sort() : [];
}

export function parseWriteup(slug: string, source: string): Writeup {
  const { data, content } = matter(source);
  const parsed = writeupFrontMatterSchema.safeParse(data);
  if (!parsed.success) throw new Error(`write-up ${slug}: ${z.prettifyError(parsed.error)}`);
  return { ...parsed.data, slug, body: content.trim() };
}

/** Reads and validates every demo content file under `dir`; throws naming the file on the first bad one. */
export function loadContent(dir = "content"): Content {
  const at = (...p: string[]) => path.join(dir, ...p);
  const makers = readJson(at("catalogue", "makers.json"), z.array(makerSchema));
  const writeupDir = at("writeups");
  return {
    workshop: readJson(at("catalogue", "workshop.json"), workshopSchema),
    makers,
    families: makers.flatMap((m) => m.families.map((f) => ({ ...f, maker: m.slug }))),
    parts: readJson(at("catalogue", "parts.json"), z.array(partSchema)),
    causes: readJson(at("catalogue", "causes.json"), z.array(causeSchema)),
    trees: filesIn(at("trees"), ".json").map((f) => readJson(at("trees", f), treeFileSchema)),
    scenario: readJson(at("history", "scenario.json"), scenarioSchema),
    writeups: filesIn(writeupDir, ".md").map((f) => parseWriteup(f.slice(0, -3), readFileSync(path.join(writeupDir, f), "utf8"))),
  };
}

/** Every slug one content file uses that another does not define, as readable messages. */
export function referenceProblems(content: Content): string[] {
  const problems: string[] = [];
  const families = new Set(content.families.map((f) => f.slug));
  const causes = new Set(content.causes.map((c) => c.slug));
  const parts = new Set(content.parts.map((p) => p.slug));
  const trees = new Map(content.trees.map((t) => [t.slug, t]));
  const need = (set: Set<string>, slug: string, what: string, where: string) => {
    if (!set.has(slug)) problems.push(`${where}: unknown ${what} "${slug}"`);
  };
  const unique = (slugs: string[], what: string) => {
    const seen = new Set<string>();
    for (const s of slugs) {
      if (seen.has(s)) problems.push(`duplicate ${what} "${s}"`);
      seen.add(s);
    }
  };
  unique(content.families.map((f) => f.slug), "family");
  unique(content.causes.map((c) => c.slug), "cause");
  unique(content.parts.map((p) => p.slug), "part");
  unique(content.parts.map((p) => p.sku), "SKU");
  unique(content.trees.map((t) => t.slug), "tree");

  for (const c of content.causes) for (const p of c.parts) need(parts, p.part, "part", `cause ${c.slug}`);
  for (const t of content.trees) {
    for (const f of t.scope) need(families, f, "family", `tree ${t.slug} scope`);
    for (const c of t.causes) need(causes, c.cause, "cause", `tree ${t.slug}`);
  }
  for (const w of content.writeups) {
    const where = `write-up ${w.slug}`;
    w.families.forEach((f) => need(families, f, "family", where));
    w.causes.forEach((c) => need(causes, c, "cause", where));
    w.parts.forEach((p) => need(parts, p, "part", where));
  }

  const s = content.scenario;
  for (const [family, spec] of Object.entries(s.families)) {
    need(families, family, "family", "scenario");
    for (const cause of Object.keys(spec.causeRates)) {
      need(causes, cause, "cause", `scenario family ${family}`);
      if (!content.trees.some((t) => t.causes.some((c) => c.cause === cause))) problems.push(`scenario family ${family}: cause "${cause}" is in no tree`);
    }
  }
  for (const factors of Object.values(s.ridingUseFactors)) for (const cause of Object.keys(factors ?? {})) need(causes, cause, "cause", "scenario riding-use factors");
  s.water.causes.forEach((c) => need(causes, c, "cause", "scenario water causes"));
  for (const tree of Object.keys(s.symptomShare)) if (!trees.has(tree)) problems.push(`scenario symptomShare: unknown tree "${tree}"`);
  for (const m of s.misweighted) {
    const option = trees.get(m.tree)?.options.find((o) => o.key === m.option);
    if (!option) problems.push(`scenario misweighted: no option "${m.option}" in tree "${m.tree}"`);
    else if ((option.evidence[m.cause] ?? "neutral") !== m.authored) {
      problems.push(`scenario misweighted: ${m.tree}/${m.option} gives "${m.cause}" ${option.evidence[m.cause] ?? "neutral"}, not ${m.authored}`);
    }
  }
  return problems;
}
