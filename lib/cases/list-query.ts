import { z } from "zod";
import { CASE_STATUSES } from "@/db/schema";

export const CASE_SORTS = ["createdAt", "reference", "status", "callerName", "family", "symptom", "technician"] as const;
export type CaseSort = (typeof CASE_SORTS)[number];
export const MAX_PAGE_SIZE = 100;
export const DEFAULT_PAGE_SIZE = 25;

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

export interface CaseListRow {
  id: number;
  reference: string;
  status: (typeof CASE_STATUSES)[number];
  callerName: string;
  callerKind: string;
  familyName: string;
  symptom: string;
  technicianName: string | null;
  likelyCause: string | null;
  likelyProbability: number | null;
  createdAt: string;
  triagedAt: string | null;
}

export interface CaseListPage {
  rows: CaseListRow[];
  total: number;
  page: number;
  limit: number;
}

/** Only the fields that differ from the defaults, for short URLs and stable SWR keys. */
export function caseQueryParams(query: Partial<CaseListQuery>): URLSearchParams {
  const params = new URLSearchParams();
  const defaults: Partial<Record<keyof CaseListQuery, string>> = { sort: "createdAt", dir: "desc", page: "1", limit: String(DEFAULT_PAGE_SIZE) };
  for (const key of ["q", "status", "family", "symptom", "technician", "from", "to", "sort", "dir", "page", "limit"] as const) {
    const value = query[key];
    if (value === undefined || value === null || value === "") continue;
    if (defaults[key] === String(value)) continue;
    params.set(key, String(value));
  }
  return params;
}

/** The SWR key (and URL) of one page of the case list. */
export function casesKey(query: Partial<CaseListQuery>): string {
  const qs = caseQueryParams(query).toString();
  return qs ? `/api/cases?${qs}` : "/api/cases";
}
