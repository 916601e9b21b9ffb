import type { Capability } from "@/lib/auth/roles";

export interface NavItem {
  href: string;
  label: string;
  capability: Capability;
}

/** The main navigation; each entry appears only to roles that may use it (the server checks again). */
export const NAV_ITEMS: NavItem[] = [
  { href: "/", label: "Home", capability: "home:read" },
  { href: "/triage/new", label: "New call", capability: "case:work" },
  { href: "/cases", label: "Cases", capability: "case:read" },
  { href: "/trees", label: "Trees", capability: "tree:read" },
  { href: "/catalogue", label: "Catalogue", capability: "catalogue:read" },
  { href: "/writeups", label: "Write-ups", capability: "writeup:read" },
  { href: "/practice", label: "Practice", capability: "practice:run" },
  { href: "/reports", label: "Reports", capability: "reports:read" },
  { href: "/outbox", label: "Outbox", capability: "outbox:read" },
  { href: "/users", label: "People", capability: "users:manage" },
];
