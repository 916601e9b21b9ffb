import { RoleHome } from "@/components/home/role-home";
import { requireRole } from "@/lib/auth/require-role";

export default async function HomePage() {
  const user = await requireRole("home:read");
  return <RoleHome user={user} />;
}
