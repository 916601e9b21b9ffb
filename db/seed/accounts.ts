import { readFileSync } from "node:fs";
import path from "node:path";
import type { Role } from "../schema";

/** The demo password every seeded account shares; printed by `npm start`. */
export const DEMO_PASSWORD = "bench-demo-2026";

export interface DemoAccount {
  id: string;
  role: Role;
  name: string;
  email: string;
}

interface WorkshopFile {
  staff: { role: Role; name: string; email: string }[];
}

// The invented staff of the invented demo workshop (content/catalogue/workshop.json).
const workshop = JSON.parse(
  readFileSync(path.join(__dirname, "../../content/catalogue/workshop.json"), "utf8"),
) as WorkshopFile;

export const DEMO_ACCOUNTS: DemoAccount[] = workshop.staff.map((s) => ({ id: `user-${s.role}`, ...s }));
