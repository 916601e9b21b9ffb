import type { Role } from "@/lib/auth/roles";
import type { EntryPointRows } from "../entry-points";

const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];
// whoever drafts write-ups or works cases (tech, senior, admin) may upload photos.
const UPLOADERS: readonly Role[] = ["admin", "senior", "tech"];
const SOME_ID = "0123456789abcdef0123456789abcdef";

export const rows: EntryPointRows = {
  actions: [],
  routes: [
    { file: "app/api/uploads/route.ts", method: "POST", path: "/api/uploads", allowed: UPLOADERS, body: {} },
    { file: "app/api/uploads/[id]/route.ts", method: "GET", path: `/api/uploads/${SOME_ID}`, allowed: ALL, params: { id: SOME_ID } },
    { file: "app/api/uploads/[id]/thumb/route.ts", method: "GET", path: `/api/uploads/${SOME_ID}/thumb`, allowed: ALL, params: { id: SOME_ID } },
  ],
};
