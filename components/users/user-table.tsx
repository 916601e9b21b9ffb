import { ROLE_LABELS } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import type { UserRow } from "@/lib/users/queries";
import { UserRowControls } from "./user-row-controls";
import { ScrollRegion } from "@/components/ui/scroll-region";

export function UserTable({ rows, me }: { rows: UserRow[]; me: SessionUser }) {
  return (
    <ScrollRegion label="People" className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="text-xs uppercase text-ink-faint">
          <tr><th className="py-2">Name</th><th>E-mail</th><th>Role</th><th>Status</th><th className="w-1/3">Change</th></tr>
        </thead>
        <tbody className="divide-y divide-ink-faint/20">
          {rows.map((row) => (
            <tr key={row.id} className={row.active ? "" : "text-ink-faint"}>
              <td className="py-2 font-medium">{row.name}</td>
              <td>{row.email}</td>
              <td>{ROLE_LABELS[row.role]}</td>
              <td>{row.active ? "active" : "deactivated"}</td>
              <td>
                {row.id === me.id ? <span className="text-ink-faint">your account</span> :
                  (row.role === "admin" && me.role !== "admin") ? <span className="text-ink-faint">administrator</span> :
                  <UserRowControls row={row} canGrantAdmin={me.role === "admin"} />}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
