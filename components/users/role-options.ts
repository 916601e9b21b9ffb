import { ALL_ROLES, ROLE_LABELS } from "@/lib/auth/roles";

export function roleOptions(canGrantAdmin: boolean) {
  return ALL_ROLES.filter((r) => canGrantAdmin || r !== "admin").map((r) => ({ value: r, label: ROLE_LABELS[r] }));
}
