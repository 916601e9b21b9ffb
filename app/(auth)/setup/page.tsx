import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { SetupForm } from "@/components/auth/setup-form";
import { setupOpen } from "@/lib/users/setup";

export const metadata: Metadata = { title: "Set up your shop" };

export default async function SetupPage() {
  if (!(await setupOpen())) {
    return (
      <AuthCard title="Already set up">
        <p className="text-sm" data-testid="setup-closed">This shop has its administrator. <Link href="/sign-in">Sign in</Link>, or ask an administrator to invite you.</p>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Set up your shop" wide intro={<p>Rootbench has no accounts yet. Create the administrator account; you can then invite the rest of the workshop by e-mail. This page closes once it is done.</p>}>
      <SetupForm />
    </AuthCard>
  );
}
