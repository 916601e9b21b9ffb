import { may, type Role } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";

type WriteupState = { status: "draft" | "published"; authorId: string | null };

/** Staff read drafts (the lead reads everything); trainees read published write-ups only. */
export function mayReadDrafts(role: Role | null | undefined): boolean {
  return may(role, "case:read");
}

export function mayReadWriteup(role: Role | null | undefined, status: WriteupState["status"]): boolean {
  return status === "published" ? may(role, "writeup:read") : mayReadDrafts(role);
}

/** Seniors and admins edit any write-up; a technician edits their own drafts until they are published. */
export function mayEditWriteup(user: Pick<SessionUser, "id" | "role">, writeup: WriteupState): boolean {
  if (may(user.role, "writeup:publish")) return true;
  return may(user.role, "writeup:draft") && writeup.status === "draft" && writeup.authorId === user.id;
}
