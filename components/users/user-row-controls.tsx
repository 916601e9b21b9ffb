"use client";
import { useActionState } from "react";
import { changeRole, setActive } from "@/app/(shop)/users/actions";
import type { UserRow } from "@/lib/users/queries";
import { roleOptions } from "./role-options";

export function UserRowControls({ row, canGrantAdmin }: { row: UserRow; canGrantAdmin: boolean }) {
  const [roleState, roleAction] = useActionState(changeRole, null);
  const [activeState, activeAction] = useActionState(setActive, null);
  const message = [roleState, activeState].find((s) => s && !s.ok);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={roleAction} className="flex items-center gap-1">
        <input type="hidden" name="userId" value={row.id} />
        <label className="sr-only" htmlFor={`role-${row.id}`}>Role for {row.name}</label>
        <select id={`role-${row.id}`} name="role" defaultValue={row.role} className="rounded border border-ink-faint/50 bg-white px-2 py-1">
          {roleOptions(canGrantAdmin).map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
        </select>
        <button type="submit" className="rounded border border-ink-faint/50 px-2 py-1 hover:bg-paper-deep">Set role</button>
      </form>
      <form action={activeAction}>
        <input type="hidden" name="userId" value={row.id} />
        <input type="hidden" name="active" value={row.active ? "false" : "true"} />
        <button type="submit" className="rounded border border-ink-faint/50 px-2 py-1 hover:bg-paper-deep">
          {row.active ? "Deactivate" : "Reactivate"}
        </button>
      </form>
      <span aria-live="polite" className="text-xs text-danger">{message && !message.ok ? message.error : ""}</span>
    </div>
  );
}
