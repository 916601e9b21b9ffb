import type { Metadata } from "next";
import { AuthCard } from "@/components/auth/auth-card";
import { LinkProblem } from "@/components/auth/link-problem";
import { SetPasswordForm } from "@/components/auth/set-password-form";
import { db } from "@/db";
import { LINK_PROBLEM, lookUpAccountToken } from "@/lib/auth/account-tokens";

export const metadata: Metadata = { title: "Accept your invitation", referrer: "no-referrer" };

export default async function InvitePage({ searchParams }: { searchParams: Promise<{ token?: string | string[] }> }) {
  const { token } = await searchParams;
  const value = typeof token === "string" ? token : "";
  const found = await lookUpAccountToken(db, value, "invite");
  if (found.status !== "valid") {
    return (
      <AuthCard title="Invitation link">
        <LinkProblem message={found.status === "expired" ? "This invitation has expired. Ask the person who invited you to send a new one." : LINK_PROBLEM.unknown}
          retry={{ href: "/sign-in", label: "Go to sign-in" }} />
      </AuthCard>
    );
  }
  return (
    <AuthCard title={`Welcome, ${found.name}`} wide intro={<p>Choose the password for <strong>{found.email}</strong>. You sign in with it afterwards.</p>}>
      <SetPasswordForm token={value} purpose="invite" email={found.email} />
    </AuthCard>
  );
}
