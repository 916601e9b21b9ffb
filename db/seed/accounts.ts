import type { Role } from "../schema";

/** The demo password every seeded account shares; printed by `npm start`. */
export const DEMO_PASSWORD = "bench-demo-2026";

export interface DemoAccount {
  id: string;
  role: Role;
  name: string;
  email: string;
}

// Invented people of the invented demo workshop.
export const DEMO_ACCOUNTS: DemoAccount[] = [
  { id: "user-admin", role: "admin", name: "Ilse Marwick", email: "admin@rootbench.test" },
  { id: "user-lead", role: "lead", name: "Tomas Brennholt", email: "lead@rootbench.test" },
  { id: "user-senior", role: "senior", name: "Rosa Quenneville", email: "senior@rootbench.test" },
  { id: "user-tech", role: "tech", name: "Dario Flintmoor", email: "tech@rootbench.test" },
  { id: "user-trainee", role: "trainee", name: "Nell Ashgrove", email: "trainee@rootbench.test" },
];
