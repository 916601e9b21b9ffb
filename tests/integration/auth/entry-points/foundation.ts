import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { signInAction } from "@/lib/auth/sign-in";
import { addUserAction, changeRoleAction, setActiveAction } from "@/lib/users/actions";
import { setThemeAction } from "@/lib/users/theme";
import { TEST_PASSWORD } from "../../../support/db";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];
const MANAGERS: readonly Role[] = ["admin", "lead"];
let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}`;

export const rows: EntryPointRows = {
  actions: [
  {
    file: "app/(auth)/sign-in/actions.ts", exportName: "signIn", spec: signInAction as AnySpec, allowed: "public",
    sample: ({ target }) => ({ email: target.email, password: TEST_PASSWORD }),
  },
  { file: "app/(auth)/sign-in/actions.ts", exportName: "signOut", spec: null, allowed: "public", sample: () => ({}) },
  {
    file: "app/(shop)/users/actions.ts", exportName: "addUser", spec: addUserAction as AnySpec, allowed: MANAGERS,
    sample: () => ({ name: "New Person", email: `new-${unique()}@rootbench.test`, role: "tech", password: "long-enough-password" }),
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
