import type { Role } from "@/lib/auth/roles";
import type { EntryPointRows } from "../entry-points";

// the lead (and admin) read all reports and export; the CSV import of past records is theirs too.
const LEADS: readonly Role[] = ["admin", "lead"];

export const rows: EntryPointRows = {
  actions: [],
  routes: [
    { file: "app/api/exports/cases/route.ts", method: "GET", path: "/api/exports/cases?last=3", allowed: LEADS },
    { file: "app/api/imports/preview/route.ts", method: "POST", path: "/api/imports/preview", allowed: LEADS },
    { file: "app/api/imports/route.ts", method: "POST", path: "/api/imports", allowed: LEADS },
  ],
};
