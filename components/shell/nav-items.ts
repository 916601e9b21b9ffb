import type { Capability } from "@/lib/auth/roles";

export interface NavItem {
  href: string;
  label: string;
  capability: Capability;
}

/** The main navigation; each entry appears only to roles that may use it (the server checks again). */
export const NAV_ITEMS: NavItem[] = [
  { href: "/", label: "Home", capability: "home:read" },
  { href: "/users", label: "People", capability: "users:manage" },
];
