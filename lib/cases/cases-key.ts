import type { CaseStatus } from "@/db/schema";
import type { CaseListQuery } from "./list-query";

// Client-safe: the case table builds its SWR keys and URLs from these.
export const CASE_SORTS = ["createdAt", "reference", "status", "callerName", "family", "symptom", "technician"] as const;
export type CaseSort = (typeof CASE_SORTS)[number];
export const MAX_PAGE_SIZE = 100;
export const DEFAULT_PAGE_SIZE = 25;

export interface CaseListRow {
  id: number;
  reference: string;
  status: CaseStatus;
  callerName: string;
  callerKind: string;
  familyName: string;
  symptom: string;
  technicianName: string | null;
  likelyCause: string | null;
  likelyProbability: number | null;
  createdAt: string;
  triagedAt: string | null;
  /** Reference of the repair this visit comes back under warranty from. */
  warrantyOf: string | null;
}

export interface CaseListPage {
  rows: CaseListRow[];
  total: number;
  page: number;
  limit: number;
}

/** Only the fields that differ from the defaults, for short URLs and stable SWR keys. */
export function caseQueryParams(query: Partial<CaseListQuery> | CaseTableQuery): URLSearchParams {
  const params = new URLSearchParams();
  const defaults: Partial<Record<keyof CaseListQuery, string>> = { sort: "createdAt", dir: "desc", page: "1", limit: String(DEFAULT_PAGE_SIZE) };
  for (const key of ["q", "status", "family", "symptom", "technician", "from", "to", "sort", "dir", "page", "limit"] as const) {
    const value = (query as Record<string, unknown>)[key];
    if (value === undefined || value === null || value === "") continue;
    if (defaults[key] === String(value)) continue;
    params.set(key, String(value));
  }
  return params;
}

/** The SWR key (and URL) of one page of the case list. */
export function casesKey(query: Partial<CaseListQuery> | CaseTableQuery): string {
  const qs = caseQueryParams(query).toString();
  return qs ? `/api/cases?${qs}` : "/api/cases";
}

export type CaseTableQuery = Partial<Record<"q" | "status" | "family" | "symptom" | "technician" | "from" | "to" | "sort" | "dir", string>> & {
  page?: number;
  limit?: number;
};

/** The table's query as kept in the page URL; the server validates it again. */
export function queryFromParams(params: URLSearchParams): CaseTableQuery {
  const out: CaseTableQuery = {};
  for (const key of ["q", "status", "family", "symptom", "technician", "from", "to", "sort", "dir"] as const) {
    const v = params.get(key);
    if (v) out[key] = v;
  }
  const page = Number(params.get("page"));
  const limit = Number(params.get("limit"));
  if (Number.isInteger(page) && page > 1) out.page = page;
  if (Number.isInteger(limit) && limit > 0 && limit <= MAX_PAGE_SIZE) out.limit = limit;
  return out;
}
