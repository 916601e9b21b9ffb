import type { Capability } from "@/lib/auth/roles";

/**
 * Every signed-in screen the accessibility sweep visits. A screen is visited by each role that
 * has its capability; `path` may use the ids found in the seeded database (see SweepIds).
 * A new page gets a row here.
 */
export interface Screen {
  name: string;
  capability: Capability;
  path: (ids: SweepIds) => string;
  /** A locator that is on the page once it has rendered (waited for before axe runs). */
  ready?: string;
  /** Triage and bench screens: the area whose every control must be at least 44 × 44 px. */
  touchArea?: string;
  /** Photographed at the tablet and phone widths (tests/e2e/screenshots) to be looked at. */
  photographed?: boolean;
}

export interface SweepIds {
  openCase: number;
  bookedInCase: number;
  onBenchCase: number;
  closedCase: number;
  tree: number;
  causeSlug: string;
  writeup: number;
  techDraft: number;
  outboxMessage: number;
  practiceCase: number;
}

export const SCREENS: Screen[] = [
  { name: "home", capability: "home:read", path: () => "/", photographed: true },
  { name: "new call", capability: "case:work", path: () => "/triage/new", touchArea: "main" },
  { name: "triage walk", capability: "case:work", path: (ids) => `/triage/${ids.openCase}`, touchArea: "main", photographed: true },
  { name: "cases", capability: "case:read", path: () => "/cases" },
  { name: "case booked in", capability: "case:read", path: (ids) => `/cases/${ids.bookedInCase}`, photographed: true },
  { name: "case on the bench", capability: "case:read", path: (ids) => `/cases/${ids.onBenchCase}`, touchArea: "[data-testid=outcome-section]" },
  { name: "bench teardown", capability: "case:read", path: (ids) => `/cases/${ids.onBenchCase}/bench`, touchArea: "main", photographed: true },
  { name: "case closed", capability: "case:read", path: (ids) => `/cases/${ids.closedCase}` },
  { name: "job card", capability: "case:read", path: (ids) => `/cases/${ids.bookedInCase}/job-card` },
  { name: "trees", capability: "tree:read", path: () => "/trees" },
  { name: "tree", capability: "tree:read", path: (ids) => `/trees/${ids.tree}` },
  { name: "tree versions", capability: "tree:read", path: (ids) => `/trees/${ids.tree}/versions` },
  { name: "tree editor", capability: "tree:edit", path: (ids) => `/trees/${ids.tree}/edit`, ready: ".react-flow__node" },
  { name: "catalogue", capability: "catalogue:read", path: () => "/catalogue" },
  { name: "cause", capability: "catalogue:edit", path: (ids) => `/catalogue/causes/${ids.causeSlug}` },
  { name: "new cause", capability: "catalogue:edit", path: () => "/catalogue/causes/new" },
  { name: "write-ups", capability: "writeup:read", path: () => "/writeups", photographed: true },
  { name: "write-up", capability: "writeup:read", path: (ids) => `/writeups/${ids.writeup}` },
  { name: "write-up editor", capability: "writeup:draft", path: (ids) => `/writeups/${ids.techDraft}/edit` },
  { name: "new write-up", capability: "writeup:draft", path: () => "/writeups/new" },
  { name: "practice", capability: "practice:run", path: () => "/practice" },
  { name: "practice case", capability: "practice:run", path: (ids) => `/practice/${ids.practiceCase}` },
  { name: "reports", capability: "reports:read", path: () => "/reports" },
  { name: "tree accuracy", capability: "reports:read", path: () => "/reports/trees" },
  { name: "parts and labour", capability: "reports:read", path: () => "/reports/parts" },
  { name: "does it last", capability: "reports:read", path: () => "/reports/lasting" },
  { name: "import", capability: "reports:import", path: () => "/reports/import" },
  { name: "outbox", capability: "outbox:read", path: () => "/outbox" },
  { name: "outbox message", capability: "outbox:read", path: (ids) => `/outbox/${ids.outboxMessage}` },
  { name: "people", capability: "users:manage", path: () => "/users" },
  { name: "account", capability: "account:edit", path: () => "/account" },
];
