import type { Role } from "./roles";

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}
