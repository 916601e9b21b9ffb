import { CAPABILITIES, type Capability } from "./roles";
import type { SessionUser } from "./session-user";

export type Access = Capability | "public";

/** The single rule check behind pages, actions and route handlers: 200, 401 or 403. */
export function authorize(user: SessionUser | null, access: Access): 200 | 401 | 403 {
  if (access === "public") return 200;
  if (!user) return 401;
  return (CAPABILITIES[access] as readonly string[]).includes(user.role) ? 200 : 403;
}
