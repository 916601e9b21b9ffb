import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";

/**
 * Every server action and route handler, with the roles allowed to call it. The role matrix test
 * fails when an entry point exists on disk without a row here. Later issues add their rows.
 */
export interface ActionEntry {
  file: string;
  exportName: string;
  spec: ActionSpec<z.ZodType, unknown> | null;
  allowed: readonly Role[] | "public";
  /**
   * Optional fixture maker, run before each call on the demo database (resetToDemo has loaded the
   * catalogue, accounts, published trees and write-ups); its result reaches `sample` as `fixture`.
   */
  setup?: (ctx: { caller: SessionUser | null; target: SessionUser }) => Promise<Record<string, unknown>>;
  /** A valid input for `caller`, so an allowed caller gets past validation. */
  sample: (ctx: { caller: SessionUser | null; target: SessionUser; fixture: Record<string, unknown> }) => Record<string, unknown>;
}

export interface RouteEntry {
  file: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  path: string;
  allowed: readonly Role[] | "public";
  params?: Record<string, string>;
  body?: unknown;
  /** Optional fixture maker (as for actions); may return `params`, `body` and `query` to use. */
  setup?: () => Promise<{ params?: Record<string, string>; body?: unknown; query?: string }>;
}

export interface EntryPointRows {
  actions: ActionEntry[];
  routes: RouteEntry[];
}

// Each domain keeps its rows in entry-points/<domain>.ts; this gathers them all.
const modules = import.meta.glob<EntryPointRows>("./entry-points/*.ts", { eager: true, import: "rows" });
export const ACTION_ENTRIES: ActionEntry[] = Object.values(modules).flatMap((m) => m.actions);
export const ROUTE_ENTRIES: RouteEntry[] = Object.values(modules).flatMap((m) => m.routes);
