import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { assemblies, causeLocations, motorFamilies } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { deleteAssemblyAction, saveAssemblyAction, saveLocationAction } from "@/lib/catalogue/assembly-actions";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";

const FAMILY = "haldrin-carrow-1";

describe("stages of a motor family's unit", () => {
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let familyId: number;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    [{ id: familyId }] = await db.select({ id: motorFamilies.id }).from(motorFamilies).where(eq(motorFamilies.slug, FAMILY));
  });

  const stages = () => db.select({ slug: assemblies.slug, parentId: assemblies.parentId, open: assemblies.openMinutes }).from(assemblies)
    .where(eq(assemblies.familyId, familyId)).orderBy(assemblies.position);
  const stage = (extra: Record<string, unknown>) => ({ family: FAMILY, name: "Display bracket", parent: "unit", openMinutes: "5", closeMinutes: "5", caution: "none", ...extra });

  it("the demo data describes every family's unit, with one outermost stage", async () => {
    const rows = await db.select({ familyId: assemblies.familyId, parentId: assemblies.parentId }).from(assemblies);
    const families = await db.select({ id: motorFamilies.id }).from(motorFamilies);
    for (const f of families) expect(rows.filter((r) => r.familyId === f.id && r.parentId === null)).toHaveLength(1);
  });

  it("a senior mechanic adds and edits a stage; others may not", async () => {
    expect((await executeAction(saveAssemblyAction, stage({ slug: "display-bracket" }), users.senior)).ok).toBe(true);
    const edited = await executeAction(saveAssemblyAction, stage({ slug: "display-bracket", originalSlug: "display-bracket", openMinutes: "8" }), users.senior);
    expect(edited.ok).toBe(true);
    expect((await stages()).find((s) => s.slug === "display-bracket")?.open).toBe(8);
    for (const who of [users.tech, users.lead, users.trainee]) {
      const refused = await executeAction(saveAssemblyAction, stage({ slug: "another" }), who);
      expect(refused.ok ? 0 : refused.status).toBe(403);
    }
  });

  it("refuses a cycle, a second outermost stage and bad minutes, leaving the stages as they were", async () => {
    const before = await stages();
    // The housing cannot sit inside the board bay, which sits inside it.
    const cycle = await executeAction(saveAssemblyAction, stage({ slug: "outer-shell", originalSlug: "outer-shell", name: "Housing", parent: "board-bay" }), users.senior);
    expect(cycle.ok ? "" : cycle.error).toMatch(/inside itself|inner stages/);
    // Nor can the unit as received be moved inside anything: nothing would be outermost.
    const noRoot = await executeAction(saveAssemblyAction, stage({ slug: "unit", originalSlug: "unit", name: "Unit", parent: "outer-shell" }), users.senior);
    expect(noRoot.ok ? "" : noRoot.error).toMatch(/outermost/);
    const twoRoots = await executeAction(saveAssemblyAction, stage({ slug: "loose-part", parent: "" }), users.senior);
    expect(twoRoots.ok ? "" : twoRoots.error).toMatch(/no parent/);
    const negative = await executeAction(saveAssemblyAction, stage({ slug: "negative", openMinutes: "-3" }), users.senior);
    expect(negative.ok ? 0 : negative.status).toBe(400);
    expect(await stages()).toEqual(before);
  });

  it("moves a cause to another stage, and will not remove a stage that still holds causes", async () => {
    const moved = await executeAction(saveLocationAction, { family: FAMILY, cause: "belt-worn", stage: "display-bracket", inspectMinutes: "4" }, users.senior);
    expect(moved.ok).toBe(true);
    const refused = await executeAction(deleteAssemblyAction, { family: FAMILY, slug: "display-bracket" }, users.senior);
    expect(refused.ok ? 0 : refused.status).toBe(409);
    await executeAction(saveLocationAction, { family: FAMILY, cause: "belt-worn", stage: "belt-bay", inspectMinutes: "5" }, users.senior);
    expect((await executeAction(deleteAssemblyAction, { family: FAMILY, slug: "display-bracket" }, users.senior)).ok).toBe(true);
    const [loc] = await db.select({ minutes: causeLocations.inspectMinutes }).from(causeLocations)
      .innerJoin(assemblies, eq(assemblies.id, causeLocations.assemblyId))
      .where(and(eq(causeLocations.familyId, familyId), eq(assemblies.slug, "belt-bay")));
    expect(loc.minutes).toBeGreaterThan(0);
    expect((await executeAction(deleteAssemblyAction, { family: FAMILY, slug: "unit" }, users.senior)).ok).toBe(false);
  });
});
