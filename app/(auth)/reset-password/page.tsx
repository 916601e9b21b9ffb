import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { LinkProblem } from "@/components/auth/link-problem";
import { ResetRequestForm } from "@/components/auth/reset-request-form";
import { SetPasswordForm } from "@/components/auth/set-password-form";
import { db } from "@/db";
import { LINK_PROBLEM, lookUpAccountToken } from "@/lib/auth/account-tokens";

export const metadata: Metadata = { title: "Reset your password", referrer: "no-referrer" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string | string[] }> }) {
  const { token } = await searchParams;
  if (token === undefined) {
    return (
      <AuthCard title="Forgot your password?" intro={<p>Enter the address you sign in with; we e-mail you a link to choose a new password.</p>}>
        <ResetRequestForm />
        <p className="mt-4 text-sm"><Link href="/sign-in">Back to sign-in</Link></p>
      </AuthCard>
    );
  }
  const value = typeof token === "string" ? token : "";
  const found = await lookUpAccountToken(db, value, "reset");
  if (found.status !== "valid") {
    return (
      <AuthCard title="Password reset link">
        <LinkProblem message={LINK_PROBLEM[found.status]} retry={{ href: "/reset-password", label: "Ask for a new link" }} />
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose a new password" wide intro={<p>For <strong>{found.email}</strong>. Every place you are signed in is signed out.</p>}>
      <SetPasswordForm token={value} purpose="reset" email={found.email} />
    </AuthCard>
  );
}
