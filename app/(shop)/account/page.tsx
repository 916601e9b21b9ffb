import type { Metadata } from "next";
import { ChangePasswordForm } from "@/components/account/change-password-form";
import { SignOutEverywhere } from "@/components/account/sign-out-everywhere";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { liveSessionCount } from "@/lib/users/queries";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const me = await requireRole("account:edit", "/account");
  const sessions = await liveSessionCount(me.id);
  return (
    <div className="flex flex-col gap-6">
      <h1>Your account</h1>
      <p className="text-sm text-ink-soft">{me.name} · {me.email} · {ROLE_LABELS[me.role]}</p>
      <Panel title="Change your password"><ChangePasswordForm email={me.email} /></Panel>
      <Panel title="Where you are signed in"><SignOutEverywhere sessions={sessions} /></Panel>
    </div>
  );
}
