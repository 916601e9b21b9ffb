import { describe, expect, it } from "vitest";
import { validateTree } from "@/lib/diagnosis";
import { treeFileSchema, treeFileToDxTree } from "@/lib/trees/file/schema";
import { content } from "./load";

const SYMPTOM_TREES = ["clicking-under-load", "pedal-slip", "grinding-noise", "water-cutout", "weak-assist", "no-power"];

describe("demo trees", () => {
  it("has a tree for each of the six reported symptoms, each with 15–40 nodes", () => {
    const { trees } = content();
    expect(trees.map((t) => t.slug)).toEqual(expect.arrayContaining(SYMPTOM_TREES));
    for (const t of trees) {
      expect(t.nodes.length, t.slug).toBeGreaterThanOrEqual(15);
      expect(t.nodes.length, t.slug).toBeLessThanOrEqual(40);
      expect(t.causes.length, t.slug).toBeGreaterThanOrEqual(5);
      expect(t.causes.length, t.slug).toBeLessThanOrEqual(10);
    }
  });

  it("every tree passes validateTree with no problems", () => {
    const { trees, causes } = content();
    for (const t of trees) expect(validateTree(treeFileToDxTree(t, causes)), t.slug).toEqual([]);
  });

  it("asks most questions with a don't-know option that carries no evidence", () => {
    for (const t of content().trees) {
      const questions = t.nodes.filter((n) => n.kind === "question");
      const withDontKnow = questions.filter((q) => t.options.some((o) => o.from === q.key && o.dontKnow));
      expect(withDontKnow.length * 2, t.slug).toBeGreaterThan(questions.length);
      for (const o of t.options.filter((x) => x.dontKnow)) expect(o.evidence, `${t.slug}/${o.key}`).toEqual({});
    }
  });

  it("concludes every listed cause somewhere and puts evidence on most options", () => {
    for (const t of content().trees) {
      const concluded = new Set(t.nodes.flatMap((n) => (n.kind === "cause" ? [n.cause] : [])));
      expect([...concluded].sort(), t.slug).toEqual(t.causes.map((c) => c.cause).sort());
      const answers = t.options.filter((o) => !o.dontKnow && t.nodes.find((n) => n.key === o.from)?.kind !== "caution");
      const weighted = answers.filter((o) => Object.keys(o.evidence).length > 0);
      expect(weighted.length / answers.length, t.slug).toBeGreaterThan(0.9);
    }
  });

  it("puts a caution before any check that needs the unit opened, and on slipping drives", () => {
    for (const t of content().trees) {
      const cautions = t.nodes.filter((n) => n.kind === "caution");
      const opening = t.nodes.filter((n) => n.kind === "check" && n.needsOpening);
      if (opening.length > 0) expect(cautions.some((n) => n.kind === "caution" && /remove the battery/i.test(n.caution)), t.slug).toBe(true);
      if (t.causes.some((c) => c.cause === "owc-cage-broken")) {
        expect(cautions.some((n) => n.kind === "caution" && /stop riding/i.test(n.caution)), t.slug).toBe(true);
      }
      for (const n of cautions) if (n.kind === "caution") expect(n.caution).toMatch(/\S{3,}/);
    }
  });

  it("lays nodes out top-down on a 260 × 140 grid with no two nodes on one spot", () => {
    for (const t of content().trees) {
      const spots = new Set(t.nodes.map((n) => `${n.position.x},${n.position.y}`));
      expect(spots.size, t.slug).toBe(t.nodes.length);
      for (const n of t.nodes) {
        expect(Math.abs(n.position.y % 140), `${t.slug}/${n.key}`).toBe(0);
        expect(Math.abs(n.position.x % 130), `${t.slug}/${n.key}`).toBe(0);
      }
      expect(t.nodes.find((n) => n.key === t.rootKey)?.position).toEqual({ x: 0, y: 0 });
    }
  });

  it("round-trips through the file schema unchanged", () => {
    for (const t of content().trees) expect(treeFileSchema.parse(JSON.parse(JSON.stringify(t)))).toEqual(t);
  });

  it("converts a tree file to the engine's shape with keys as ids and catalogue inspection minutes", () => {
    const { trees, causes } = content();
    const file = trees.find((t) => t.slug === "clicking-under-load");
    if (!file) throw new Error("clicking-under-load missing");
    const dx = treeFileToDxTree(file, causes);
    expect(dx.rootId).toBe("q-when");
    expect(dx.nodes).toHaveLength(file.nodes.length);
    expect(dx.nodes.find((n) => n.id === "c-owc-cage")).toEqual({ id: "c-owc-cage", kind: "cause", causeId: "owc-cage-broken" });
    expect(dx.nodes.find((n) => n.id === "k-clutch")).toEqual({ id: "k-clutch", kind: "check", costMinutes: 40 });
    const option = dx.options.find((o) => o.id === "o-strike-yes");
    expect(option).toMatchObject({ nodeId: "q-strike", to: "q-slip", dontKnow: false });
    expect(option?.evidence["owc-cage-broken"]).toBe("strong");
    const inspect = causes.find((c) => c.slug === "owc-cage-broken")?.inspectMinutes;
    expect(dx.causes.find((c) => c.id === "owc-cage-broken")).toEqual({ id: "owc-cage-broken", priorWeight: 5, inspectMinutes: inspect });
    expect(treeFileToDxTree(file).causes[0]).not.toHaveProperty("inspectMinutes");
  });
});
