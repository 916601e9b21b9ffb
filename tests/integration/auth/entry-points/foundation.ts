import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { signInAction } from "@/lib/auth/sign-in";
import { changeRoleAction, forceResetAction, setActiveAction } from "@/lib/users/actions";
import { inviteUserAction } from "@/lib/users/invite";
import { changePasswordAction, requestResetAction, setPasswordFromLinkAction, signOutEverywhereAction } from "@/lib/users/password";
import { setupAction } from "@/lib/users/setup";
import { setThemeAction } from "@/lib/users/theme";
import { TEST_PASSWORD } from "../../../support/db";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];
const MANAGERS: readonly Role[] = ["admin", "lead"];
let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}`;
const NEW_PASSWORD = "tarnished crank seventeen";

export const rows: EntryPointRows = {
  actions: [
  {
    file: "app/(auth)/sign-in/actions.ts", exportName: "signIn", spec: signInAction as AnySpec, allowed: "public",
    sample: ({ target }) => ({ email: target.email, password: TEST_PASSWORD }),
  },
  { file: "app/(auth)/sign-in/actions.ts", exportName: "signOut", spec: null, allowed: "public", sample: () => ({}) },
  {
    // On the demo database the shop is set up already: a valid request gets its 409, never 401/403.
    file: "app/(auth)/setup/actions.ts", exportName: "setUpShop", spec: setupAction as AnySpec, allowed: "public",
    sample: () => ({ name: "First Admin", email: `first-${unique()}@rootbench.test`, password: NEW_PASSWORD, confirm: NEW_PASSWORD, shopName: "Test Workshop", shopEmail: "desk@rootbench.test" }),
  },
  {
    file: "app/(auth)/reset-password/actions.ts", exportName: "requestReset", spec: requestResetAction as AnySpec, allowed: "public",
    sample: ({ target }) => ({ email: target.email }),
  },
  {
    file: "app/(auth)/reset-password/actions.ts", exportName: "setPasswordFromLink", spec: setPasswordFromLinkAction as AnySpec, allowed: "public",
    sample: () => ({ token: "not-a-real-token", purpose: "reset", password: NEW_PASSWORD, confirm: NEW_PASSWORD }),
  },
  {
    file: "app/(shop)/account/actions.ts", exportName: "changePassword", spec: changePasswordAction as AnySpec, allowed: ALL,
    // A wrong current password: the caller gets past role and validation and keeps their password.
    sample: () => ({ current: "not-the-current-one", password: NEW_PASSWORD, confirm: NEW_PASSWORD }),
  },
  {
    file: "app/(shop)/account/actions.ts", exportName: "signOutEverywhere", spec: signOutEverywhereAction as AnySpec, allowed: ALL,
    sample: () => ({}),
  },
  {
    file: "app/(shop)/users/actions.ts", exportName: "inviteUser", spec: inviteUserAction as AnySpec, allowed: MANAGERS,
    sample: () => ({ name: "New Person", email: `new-${unique()}@rootbench.test`, role: "tech" }),
  },
  {
    file: "app/(shop)/users/actions.ts", exportName: "changeRole", spec: changeRoleAction as AnySpec, allowed: MANAGERS,
    sample: ({ target }) => ({ userId: target.id, role: "senior" }),
  },
  {
    file: "app/(shop)/users/actions.ts", exportName: "setActive", spec: setActiveAction as AnySpec, allowed: MANAGERS,
    sample: ({ target }) => ({ userId: target.id, active: "true" }),
  },
  {
    file: "app/(shop)/users/actions.ts", exportName: "forceReset", spec: forceResetAction as AnySpec, allowed: ["admin"],
    sample: ({ target }) => ({ userId: target.id }),
  },
  {
    file: "app/(shop)/actions.ts", exportName: "setTheme", spec: setThemeAction as AnySpec, allowed: ALL,
    sample: () => ({ theme: "dark" }),
  },
],
  routes: [
  { file: "app/api/health/route.ts", method: "GET", path: "/api/health", allowed: "public" },
  { file: "app/api/session/route.ts", method: "GET", path: "/api/session", allowed: ALL },
  { file: "app/api/session/route.ts", method: "DELETE", path: "/api/session", allowed: ALL },
],
};
