import { z } from "zod";
import { CALLER_KINDS, RIDING_USES } from "@/db/schema";
import { SEND_KINDS } from "./shipping";

const id = (message: string) => z.coerce.number({ error: message }).int(message).positive(message);

// Digits with the usual separators; 6 to 15 digits (the E.164 maximum), an optional leading +.
const PHONE = /^\+?[0-9][0-9 ()./-]*$/;
const phone = z.string().trim().max(40, "That phone number is too long.").refine(
  (v) => v === "" || (PHONE.test(v) && (v.match(/[0-9]/g)?.length ?? 0) >= 6 && (v.match(/[0-9]/g)?.length ?? 0) <= 15),
  "Enter a phone number of 6 to 15 digits; spaces, dashes and a leading + are fine.",
);
const email = z.string().trim().toLowerCase().max(200, "That address is too long.").refine(
  (v) => v === "" || z.email().safeParse(v).success,
  "That is not an e-mail address (it needs a name, an @ and a domain).",
);

export const startCaseInput = z.object({
  callerName: z.string().trim().min(1, "Enter the caller's name.").max(120, "Keep the name under 120 characters."),
  callerKind: z.enum(CALLER_KINDS, { error: "Rider or dealer?" }),
  phone,
  email,
  familyId: id("Pick the motor family."),
  serial: z.string().trim().max(40, "Serial numbers here are at most 40 characters.").default(""),
  ridingUse: z.enum(RIDING_USES, { error: "Pick how the bike is ridden." }),
  treeVersionId: id("Pick the symptom the caller reports."),
  callerWords: z.string().trim().max(2000, "Keep the caller's words under 2,000 characters.").default(""),
}).superRefine((v, ctx) => {
  if (!v.phone && !v.email) {
    ctx.addIssue({ code: "custom", path: ["phone"], message: "Give a phone number or an e-mail address, so we can reach the caller." });
  }
});
export type StartCaseInput = z.infer<typeof startCaseInput>;

export const answerInput = z.object({ caseId: id("No case given."), nodeId: id("No question given."), optionId: id("No answer given.") });
export type AnswerInput = z.infer<typeof answerInput>;

export const undoInput = z.object({ caseId: id("No case given."), seq: id("No step given.") });

export const notesInput = z.object({ caseId: id("No case given."), notes: z.string().max(20000, "Notes are limited to 20,000 characters.") });

export const finishInput = z.discriminatedUnion("outcome", [
  z.object({
    outcome: z.literal("advised"),
    caseId: id("No case given."),
    advice: z.string().trim().min(1, "Write down what you advised.").max(4000, "Keep the advice under 4,000 characters."),
  }),
  z.object({
    outcome: z.literal("booked_in"),
    caseId: id("No case given."),
    send: z.enum(SEND_KINDS, { error: "Say what the caller must send." }),
    advice: z.string().trim().max(4000, "Keep the note under 4,000 characters.").default(""),
  }),
], { error: "Pick advised or booked in." });
export type FinishInput = z.infer<typeof finishInput>;
