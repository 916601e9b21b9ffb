import { may, ROLE_LABELS } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import type { AccountState, UserRow } from "@/lib/users/queries";
import { UserRowControls } from "./user-row-controls";
import { ScrollRegion } from "@/components/ui/scroll-region";

const STATE_LABELS: Record<AccountState, string> = {
  active: "active",
  invited: "invited, no password yet",
  "must-reset": "must choose a new password",
  deactivated: "deactivated",
};

export function UserTable({ rows, me }: { rows: UserRow[]; me: SessionUser }) {
  return (
    <ScrollRegion label="People" className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="text-xs uppercase text-ink-faint">
          <tr><th className="py-2 pr-3">Name</th><th className="pr-3">E-mail</th><th className="pr-3">Role</th><th className="pr-3">Status</th><th className="w-2/5">Change</th></tr>
        </thead>
        <tbody className="divide-y divide-ink-faint/20">
          {rows.map((row) => (
            <tr key={row.id} className={row.active ? "" : "text-ink-faint"} data-testid={`user-${row.email}`}>
              <td className="py-2 pr-3 font-medium">{row.name}</td>
              <td className="pr-3">{row.email}</td>
              <td className="pr-3">{ROLE_LABELS[row.role]}</td>
              <td className="pr-3">{STATE_LABELS[row.state]}</td>
              <td>
                {row.id === me.id ? <span className="text-ink-faint">your account</span> :
                  (row.role === "admin" && me.role !== "admin") ? <span className="text-ink-faint">administrator</span> :
                  <UserRowControls row={row} canGrantAdmin={me.role === "admin"} canForceReset={may(me.role, "users:force-reset")} />}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
