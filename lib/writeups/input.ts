import { z } from "zod";

// FormData gives one string for one checked box and an array for several; none gives nothing.
const asArray = (value: unknown) => (value === undefined || value === "" ? [] : Array.isArray(value) ? value : [value]);

const idList = (what: string) =>
  z.preprocess(
    asArray,
    z.array(z.coerce.number({ error: `Pick ${what} from the list.` }).int().positive(`Pick ${what} from the list.`)).max(40, `Pick at most 40 ${what}.`),
  );

export const MAX_TAGS = 12;

export const tagList = z
  .string()
  .max(600, "Keep the tags short.")
  .default("")
  .transform((raw) => [...new Set(raw.split(",").map((t) => t.trim().toLowerCase().replace(/\s+/g, " ")).filter(Boolean))])
  // Checked on the whole list so the message lands on the tags field, not on "tags.3".
  .refine((tags) => tags.every((t) => t.length <= 40), "Each tag must be under 40 characters.")
  .refine((tags) => tags.every((t) => /^[\p{L}\p{N} .+/-]+$/u.test(t)), "Tags may hold letters, digits, spaces and . + / -")
  .refine((tags) => tags.length <= MAX_TAGS, `Use at most ${MAX_TAGS} tags.`);

export const writeupInput = z.object({
  id: z.preprocess((v) => (v === "" ? undefined : v), z.coerce.number().int().positive().optional()),
  /** When the editor was opened on an existing write-up: its updated_at, to catch a save over someone else's. */
  expectedUpdatedAt: z.string().max(40).optional().default(""),
  title: z.string().trim().min(5, "Give the write-up a title of at least 5 characters.").max(160, "Keep the title under 160 characters."),
  summary: z.string().trim().min(10, "Write a summary of at least 10 characters: what failed and why.").max(400, "Keep the summary under 400 characters."),
  body: z
    .string()
    .trim()
    .min(20, "Write the body: what was reported, what was found, what was done.")
    .max(50_000, "The body is over 50,000 characters; split it into two write-ups."),
  familyIds: idList("motor families"),
  causeIds: idList("causes"),
  partIds: idList("parts"),
  tags: tagList,
  caseReference: z.string().trim().max(40, "A case reference is shorter than that.").optional().default(""),
  intent: z.enum(["draft", "publish"], { error: "Choose to save a draft or to publish." }),
});

export type WriteupInput = z.output<typeof writeupInput>;

export const writeupIdInput = z.object({ id: z.coerce.number({ error: "No write-up given." }).int().positive("No write-up given.") });
