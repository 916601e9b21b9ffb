import { may, type Role } from "@/lib/auth/roles";

/** Who may upload files: whoever drafts write-ups or works cases (bench photos). */
export function mayUpload(role: Role | null | undefined): boolean {
  return may(role, "writeup:draft") || may(role, "case:work");
}
