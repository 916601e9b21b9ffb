import type { Metadata } from "next";
import { InviteForm } from "@/components/users/invite-form";
import { UserTable } from "@/components/users/user-table";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { listUsers } from "@/lib/users/queries";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage({ searchParams }: { searchParams: Promise<{ welcome?: string }> }) {
  const me = await requireRole("users:manage", "/users");
  const { welcome } = await searchParams;
  const rows = await listUsers();
  return (
    <div className="flex flex-col gap-6">
      <h1>People and roles</h1>
      {welcome ? (
        <p role="status" className="rounded-md border border-moss bg-moss-light px-3 py-2 text-sm">
          Your shop is set up and you are its administrator. Invite the people who work with you below.
        </p>
      ) : null}
      <Panel title="Invite a person"><InviteForm canGrantAdmin={me.role === "admin"} /></Panel>
      <Panel title="Accounts"><UserTable rows={rows} me={me} /></Panel>
    </div>
  );
}
