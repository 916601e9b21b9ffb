import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { caseEvents, cases, motorFamilies, trees, treeScope, treeVersions } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError, pgErrorCode } from "@/lib/errors";
import { startCaseInput, type StartCaseInput } from "./inputs";
import { nextReference } from "@/lib/cases/reference";
import { loadShop } from "@/lib/cases/shop";

async function checkTree(input: StartCaseInput) {
  const [family] = await db.select({ id: motorFamilies.id }).from(motorFamilies).where(eq(motorFamilies.id, input.familyId)).limit(1);
  if (!family) throw new AppError("invalid", "Pick a motor family from the list.", { fieldErrors: { familyId: "Pick a motor family from the list." } });
  const [version] = await db
    .select({ id: treeVersions.id, state: treeVersions.state, treeId: trees.id, symptom: trees.symptom, archived: trees.archived })
    .from(treeVersions).innerJoin(trees, eq(trees.id, treeVersions.treeId))
    .where(eq(treeVersions.id, input.treeVersionId)).limit(1);
  const pickAgain = (message: string) => new AppError("invalid", message, { fieldErrors: { treeVersionId: message } });
  if (!version || version.state !== "published" || version.archived) throw pickAgain("Pick one of the published trees listed.");
  const [newest] = await db.select({ id: treeVersions.id }).from(treeVersions)
    .where(and(eq(treeVersions.treeId, version.treeId), eq(treeVersions.state, "published")))
    .orderBy(desc(treeVersions.number)).limit(1);
  if (newest?.id !== version.id) throw pickAgain("A newer version of this tree was published a moment ago; pick it again.");
  const scope = await db.select({ familyId: treeScope.familyId }).from(treeScope).where(eq(treeScope.treeId, version.treeId));
  if (scope.length > 0 && !scope.some((s) => s.familyId === input.familyId)) throw pickAgain("That tree is not made for this motor family.");
  return version;
}

export async function startCase(input: StartCaseInput, userId: string): Promise<{ id: number; reference: string }> {
  const version = await checkTree(input);
  const shop = await loadShop();
  try {
    return await db.transaction(async (tx) => {
      const now = new Date();
      const reference = await nextReference(tx, shop.code, now);
      const [row] = await tx.insert(cases).values({
        reference, status: "open", callerName: input.callerName, callerKind: input.callerKind, phone: input.phone,
        email: input.email, familyId: input.familyId, serial: input.serial, ridingUse: input.ridingUse,
        symptom: version.symptom, treeVersionId: version.id, technicianId: userId,
        notes: input.callerWords ? `In the caller's words: ${input.callerWords}\n` : "", createdAt: now, updatedAt: now,
      }).returning({ id: cases.id, reference: cases.reference });
      await tx.insert(caseEvents).values({ caseId: row.id, kind: "opened", toStatus: "open", byUserId: userId, note: `Triage started on “${version.symptom}”.` });
      return row;
    });
  } catch (error) {
    if (pgErrorCode(error) === "23505") throw new AppError("conflict", "Two cases took the same reference at once; please press Start again.");
    throw error;
  }
}

export const startCaseAction = defineAction({
  name: "cases.start",
  access: "case:work",
  input: startCaseInput,
  run: (input, { user }) => startCase(input, user.id),
});
