import type { Metadata } from "next";
import { AddUserForm } from "@/components/users/add-user-form";
import { UserTable } from "@/components/users/user-table";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { listUsers } from "@/lib/users/queries";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const me = await requireRole("users:manage", "/users");
  const rows = await listUsers();
  return (
    <div className="flex flex-col gap-6">
      <h1>People and roles</h1>
      <Panel title="Accounts"><UserTable rows={rows} me={me} /></Panel>
      <Panel title="Add a person"><AddUserForm canGrantAdmin={me.role === "admin"} /></Panel>
    </div>
  );
}
