import { z } from "zod";
import { UPGRADE_KINDS, type UpgradeKind } from "@/db/schema";

/** Limits of a bench outcome, shared by the form and the server. */
export const OUTCOME_LIMITS = {
  causes: 8,
  parts: 30,
  quantity: 99,
  labourMinutes: 6000,
  otherCause: 300,
  upgrades: 1000,
  notes: 4000,
  reopenReason: 500,
} as const;

export const OTHER_PRIMARY = "other";

// FormData gives one string for one value and an array for repeated names; rows are parallel lists.
const list = z.preprocess((v) => (v === undefined || v === null ? [] : Array.isArray(v) ? v : [v]), z.array(z.string().max(40)).max(60));
// Every field check runs in one transform, so a form with several mistakes gets all its messages at once.
const raw = z.string().max(20_000, "That is far too long.").default("");
const caseId = z.coerce.number({ error: "No case given." }).int().positive("No case given.");

export const outcomeFormInput = z
  .object({
    caseId,
    intent: z.enum(["save", "close"]).default("save"),
    causeId: list,
    primaryCause: z.string().trim().max(40).default(""),
    otherCause: raw,
    partId: list,
    partQty: list,
    upgrades: raw,
    upgradeKind: list,
    labourMinutes: raw,
    notes: raw,
    detachPhotoId: list,
  })
  .transform((raw, ctx) => {
    const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: "custom", path, message });
    const text = (field: "otherCause" | "upgrades" | "notes", max: number, what: string) => {
      const value = raw[field].trim();
      if (value.length > max) issue([field], `Keep the ${what} under ${max} characters.`);
      return value;
    };
    const otherCause = text("otherCause", OUTCOME_LIMITS.otherCause, "description of the other cause");
    const upgrades = text("upgrades", OUTCOME_LIMITS.upgrades, "upgrades");
    const upgradeKinds: UpgradeKind[] = [];
    for (const v of raw.upgradeKind) {
      if (!(UPGRADE_KINDS as readonly string[]).includes(v)) issue(["upgradeKind"], "Pick upgrades from the list.");
      else if (!upgradeKinds.includes(v as UpgradeKind)) upgradeKinds.push(v as UpgradeKind);
    }
    const notes = text("notes", OUTCOME_LIMITS.notes, "notes");
    const labourText = raw.labourMinutes.trim();
    const labourMinutes = labourText === "" ? 0 : Number(labourText);
    if (!Number.isFinite(labourMinutes)) issue(["labourMinutes"], "Enter the labour in minutes, as a number.");
    else if (!Number.isInteger(labourMinutes)) issue(["labourMinutes"], "Use whole minutes.");
    else if (labourMinutes < 0) issue(["labourMinutes"], "Labour cannot be negative.");
    else if (labourMinutes > OUTCOME_LIMITS.labourMinutes) issue(["labourMinutes"], `More than ${OUTCOME_LIMITS.labourMinutes} minutes? Check the figure.`);

    const causeIds: number[] = [];
    raw.causeId.forEach((v, i) => {
      if (v === "") return;
      const id = Number(v);
      if (!Number.isSafeInteger(id) || id <= 0) return issue(["causeId", i], "Pick a cause from the catalogue.");
      if (causeIds.includes(id)) return issue(["causeId", i], "This cause is listed twice.");
      causeIds.push(id);
    });
    if (causeIds.length > OUTCOME_LIMITS.causes) issue(["causeId"], `At most ${OUTCOME_LIMITS.causes} confirmed causes.`);

    let primary: number | "other" | null = null;
    if (raw.primaryCause === OTHER_PRIMARY) {
      primary = OTHER_PRIMARY;
      if (!otherCause) issue(["otherCause"], "Describe the cause that is not in the catalogue.");
    } else if (raw.primaryCause !== "") {
      const id = Number(raw.primaryCause);
      if (!causeIds.includes(id)) issue(["primaryCause"], "The primary cause must be one of the confirmed causes.");
      else primary = id;
    } else if (causeIds.length === 1) {
      primary = causeIds[0];
    } else if (causeIds.length > 1) {
      issue(["primaryCause"], "Mark which confirmed cause is the primary one.");
    } else if (otherCause) {
      primary = OTHER_PRIMARY;
    }

    const parts: { partId: number; quantity: number }[] = [];
    const rows = Math.max(raw.partId.length, raw.partQty.length);
    for (let i = 0; i < rows; i++) {
      const part = (raw.partId[i] ?? "").trim();
      const qty = (raw.partQty[i] ?? "").trim();
      if (part === "") {
        if (qty !== "" && qty !== "1") issue(["partId", i], "Pick the part, or clear the quantity.");
        continue;
      }
      const partId = Number(part);
      if (!Number.isSafeInteger(partId) || partId <= 0) { issue(["partId", i], "Pick a part from the catalogue."); continue; }
      if (parts.some((p) => p.partId === partId)) { issue(["partId", i], "This part is listed twice; add the quantities up in one row."); continue; }
      const quantity = Number(qty);
      if (qty === "" || !Number.isInteger(quantity)) { issue(["partQty", i], "Enter how many, as a whole number."); continue; }
      if (quantity < 1 || quantity > OUTCOME_LIMITS.quantity) { issue(["partQty", i], `Between 1 and ${OUTCOME_LIMITS.quantity}.`); continue; }
      parts.push({ partId, quantity });
    }
    if (parts.length > OUTCOME_LIMITS.parts) issue(["partId"], `At most ${OUTCOME_LIMITS.parts} different parts.`);

    if (raw.intent === "close" && primary === null) {
      issue(["causeId"], "Record the confirmed cause before closing the case.");
    }
    return {
      caseId: raw.caseId,
      intent: raw.intent,
      causeIds,
      primary,
      otherCause,
      parts,
      upgrades,
      upgradeKinds,
      labourMinutes,
      notes,
      detachPhotoIds: raw.detachPhotoId.filter((id) => /^[a-f0-9]{32}$/.test(id)),
    };
  });
export type OutcomeInput = z.output<typeof outcomeFormInput>;

export const caseOnlyInput = z.object({ caseId });

export const reopenInput = z.object({
  caseId,
  reason: z.string().trim()
    .min(5, "Say why the case is reopened (at least a few words).")
    .max(OUTCOME_LIMITS.reopenReason, `Keep the reason under ${OUTCOME_LIMITS.reopenReason} characters.`),
});
