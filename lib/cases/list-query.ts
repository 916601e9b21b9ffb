import { z } from "zod";
import { CASE_STATUSES } from "@/db/schema";

import { CASE_SORTS, DEFAULT_PAGE_SIZE, MAX_PAGE_SIZE } from "./cases-key";

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-03-31.").refine((v) => !Number.isNaN(Date.parse(v)), "That date does not exist.");
const blankToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);

/** The /api/cases query, also kept in the /cases page URL. */
export const caseListQuery = z.object({
  status: z.preprocess(blankToUndefined, z.enum(CASE_STATUSES).optional()),
  family: z.preprocess(blankToUndefined, z.coerce.number().int().positive().optional()),
  symptom: z.preprocess(blankToUndefined, z.string().trim().max(200).optional()),
  technician: z.preprocess(blankToUndefined, z.string().trim().max(64).optional()),
  from: z.preprocess(blankToUndefined, day.optional()),
  to: z.preprocess(blankToUndefined, day.optional()),
  q: z.preprocess(blankToUndefined, z.string().trim().max(120).optional()),
  sort: z.preprocess(blankToUndefined, z.enum(CASE_SORTS).default("createdAt")),
  dir: z.preprocess(blankToUndefined, z.enum(["asc", "desc"]).default("desc")),
  page: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(100000).default(1)),
  limit: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(MAX_PAGE_SIZE, `At most ${MAX_PAGE_SIZE} rows a page.`).default(DEFAULT_PAGE_SIZE)),
}).refine((v) => !v.from || !v.to || v.from <= v.to, { path: ["to"], message: "The end date is before the start date." });
export type CaseListQuery = z.output<typeof caseListQuery>;
