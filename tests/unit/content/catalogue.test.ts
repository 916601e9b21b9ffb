import { describe, expect, it } from "vitest";
import { causeAreaSchema, referenceProblems, roleSchema } from "@/db/seed/content";
import { content } from "./load";

describe("demo catalogue", () => {
  it("parses every catalogue file and every slug it references exists", () => {
    const c = content();
    expect(referenceProblems(c)).toEqual([]);
  });

  it("has the invented shop with one staff account per role at rootbench.test", () => {
    const { workshop } = content();
    expect(workshop.staff.map((s) => s.role).sort()).toEqual([...roleSchema.options].sort());
    for (const s of workshop.staff) expect(s.email).toBe(`${s.role}@rootbench.test`);
  });

  it("has 4–5 makers with about eleven families between them", () => {
    const { makers, families } = content();
    expect(makers.length).toBeGreaterThanOrEqual(4);
    expect(makers.length).toBeLessThanOrEqual(5);
    for (const m of makers) expect(m.families.length).toBeGreaterThanOrEqual(2);
    expect(families.length).toBeGreaterThanOrEqual(10);
  });

  it("has at least 32 causes covering every area of the unit, and about 40 parts", () => {
    const { causes, parts } = content();
    expect(causes.length).toBeGreaterThanOrEqual(32);
    expect(new Set(causes.map((c) => c.area))).toEqual(new Set(causeAreaSchema.options));
    expect(parts.length).toBeGreaterThanOrEqual(38);
  });

  it("carries the one-way clutch rating of about 240 N·m on the primary clutch cause", () => {
    const { causes, trees, writeups } = content();
    const clutch = causes.find((c) => c.slug === "owc-cage-broken");
    // A one-way clutch rated about 240 N·m: common practice, no published source.
    expect(clutch?.ratingNm).toBe(240);
    expect(clutch?.description).toMatch(/240 N·m/);
    expect(clutch?.description).toMatch(/pedal strike/i);

    const cautionTexts = trees.flatMap((t) => t.nodes.flatMap((n) => (n.kind === "caution" ? [n.caution] : [])));
    const texts = [...cautionTexts, ...writeups.map((w) => w.body)];
    expect(texts.filter((t) => t.includes("240 N·m")).length).toBeGreaterThan(0);
  });
});
