"use client";
import { useActionState } from "react";
import { changeRole, forceReset, inviteUser, setActive } from "@/app/(shop)/users/actions";
import type { UserRow } from "@/lib/users/queries";
import { roleOptions } from "./role-options";

const BUTTON = "rounded border border-ink-faint/50 px-2 py-1 hover:bg-paper-deep";

export function UserRowControls({ row, canGrantAdmin, canForceReset }: { row: UserRow; canGrantAdmin: boolean; canForceReset: boolean }) {
  const [roleState, roleAction] = useActionState(changeRole, null);
  const [activeState, activeAction] = useActionState(setActive, null);
  const [inviteState, inviteAction] = useActionState(inviteUser, null);
  const [resetState, resetAction] = useActionState(forceReset, null);
  const latest = [roleState, activeState, inviteState, resetState].find((s) => s);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={roleAction} className="flex items-center gap-1">
        <input type="hidden" name="userId" value={row.id} />
        <label className="sr-only" htmlFor={`role-${row.id}`}>Role for {row.name}</label>
        <select id={`role-${row.id}`} name="role" defaultValue={row.role} className="rounded border border-ink-faint/50 bg-white px-2 py-1">
          {roleOptions(canGrantAdmin).map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
        </select>
        <button type="submit" className={BUTTON}>Set role</button>
      </form>
      <form action={activeAction}>
        <input type="hidden" name="userId" value={row.id} />
        <input type="hidden" name="active" value={row.active ? "false" : "true"} />
        <button type="submit" className={BUTTON}>{row.active ? "Deactivate" : "Reactivate"}</button>
      </form>
      {row.state === "invited" ? (
        <form action={inviteAction}>
          <input type="hidden" name="name" value={row.name} />
          <input type="hidden" name="email" value={row.email} />
          <input type="hidden" name="role" value={row.role} />
          <button type="submit" className={BUTTON}>Send a new invitation</button>
        </form>
      ) : null}
      {canForceReset && (row.state === "active" || row.state === "must-reset") ? (
        <form action={resetAction}>
          <input type="hidden" name="userId" value={row.id} />
          <button type="submit" className={BUTTON}>Force a password reset</button>
        </form>
      ) : null}
      <span aria-live="polite" className={`text-xs ${latest && !latest.ok ? "text-danger" : "text-moss"}`}>
        {latest ? (latest.ok ? latest.message : latest.error) : ""}
      </span>
    </div>
  );
}
