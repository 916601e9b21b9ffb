export const ROLES = ["admin", "lead", "senior", "tech", "trainee"] as const;
export type Role = (typeof ROLES)[number];
export const ALL_ROLES: readonly Role[] = ROLES;

const STAFF: readonly Role[] = ["admin", "lead", "senior", "tech"];
const WORKERS: readonly Role[] = ["admin", "senior", "tech"];
const EDITORS: readonly Role[] = ["admin", "senior"];

/** Who may do what (DESIGN §2). Every server entry point names one of these. */
export const CAPABILITIES = {
  "home:read": ALL_ROLES,
  "case:read": STAFF,
  "case:work": WORKERS,
  "case:reopen": EDITORS,
  "tree:read": ALL_ROLES,
  "tree:edit": EDITORS,
  "catalogue:read": ALL_ROLES,
  "catalogue:edit": EDITORS,
  "writeup:read": ALL_ROLES,
  "writeup:draft": WORKERS,
  "writeup:publish": EDITORS,
  "practice:run": ALL_ROLES,
  "reports:read": ["admin", "lead", "senior"],
  "reports:export": ["admin", "lead"],
  "reports:import": ["admin", "lead"],
  "users:manage": ["admin", "lead"],
  "outbox:read": ["admin", "lead"],
  "settings:edit": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof CAPABILITIES;

export function may(role: Role | null | undefined, capability: Capability): boolean {
  return !!role && (CAPABILITIES[capability] as readonly Role[]).includes(role);
}

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Administrator",
  lead: "Shop lead",
  senior: "Senior mechanic",
  tech: "Technician",
  trainee: "Trainee",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ALL_ROLES as readonly string[]).includes(value);
}
