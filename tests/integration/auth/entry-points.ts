import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { signInAction } from "@/lib/auth/sign-in";
import { TEST_PASSWORD } from "../../support/db";
import { addUserAction, changeRoleAction, setActiveAction } from "@/lib/users/actions";

/**
 * Every server action and route handler, with the roles DESIGN §2 allows. The role matrix test
 * fails when an entry point exists on disk without a row here. Later issues add their rows.
 */
export interface ActionEntry {
  file: string;
  exportName: string;
  spec: ActionSpec<z.ZodType, unknown> | null;
  allowed: readonly Role[] | "public";
  /** A valid input for `caller`, so an allowed caller gets past validation. */
  sample: (ctx: { caller: SessionUser | null; target: SessionUser }) => Record<string, unknown>;
}

export interface RouteEntry {
  file: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  path: string;
  allowed: readonly Role[] | "public";
  params?: Record<string, string>;
  body?: unknown;
}

const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];
const MANAGERS: readonly Role[] = ["admin", "lead"];
let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}`;

export const ACTION_ENTRIES: ActionEntry[] = [
  {
    file: "app/(auth)/sign-in/actions.ts", exportName: "signIn", spec: signInAction as ActionSpec<z.ZodType, unknown>, allowed: "public",
    sample: ({ target }) => ({ email: target.email, password: TEST_PASSWORD }),
  },
  { file: "app/(auth)/sign-in/actions.ts", exportName: "signOut", spec: null, allowed: "public", sample: () => ({}) },
  {
    file: "app/(shop)/users/actions.ts", exportName: "addUser", spec: addUserAction as ActionSpec<z.ZodType, unknown>, allowed: MANAGERS,
    sample: () => ({ name: "New Person", email: `new-${unique()}@rootbench.test`, role: "tech", password: "long-enough-password" }),
  },
  {
    file: "app/(shop)/users/actions.ts", exportName: "changeRole", spec: changeRoleAction as ActionSpec<z.ZodType, unknown>, allowed: MANAGERS,
    sample: ({ target }) => ({ userId: target.id, role: "senior" }),
  },
  {
    file: "app/(shop)/users/actions.ts", exportName: "setActive", spec: setActiveAction as ActionSpec<z.ZodType, unknown>, allowed: MANAGERS,
    sample: ({ target }) => ({ userId: target.id, active: "true" }),
  },
];

export const ROUTE_ENTRIES: RouteEntry[] = [
  { file: "app/api/health/route.ts", method: "GET", path: "/api/health", allowed: "public" },
  { file: "app/api/session/route.ts", method: "GET", path: "/api/session", allowed: ALL },
  { file: "app/api/session/route.ts", method: "DELETE", path: "/api/session", allowed: ALL },
];
