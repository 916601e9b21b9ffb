import type { Role } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";

/** Only an administrator may hand out or take away the administrator role. */
export function assertMayAssign(actor: SessionUser, role: Role, currentRole?: Role): void {
  if ((role === "admin" || currentRole === "admin") && actor.role !== "admin") {
    throw new AppError("forbidden", "Only an administrator may grant or change the administrator role.");
  }
}
