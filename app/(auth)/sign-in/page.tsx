import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/auth-card";
import { SignInForm } from "@/components/auth/sign-in-form";
import { isDemoMode } from "@/lib/auth/demo-mode";
import { currentUser } from "@/lib/auth/session";
import { setupOpen } from "@/lib/users/setup";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; password?: string }> }) {
  if (await currentUser()) redirect("/");
  if (await setupOpen()) redirect("/setup");
  const { next, password } = await searchParams;
  return (
    <AuthCard title="Rootbench" intro={<p>Drive-unit triage and bench records. Sign in with your workshop account.</p>}>
      {isDemoMode() ? (
        <p className="mb-4 rounded-md border border-copper bg-copper-light px-3 py-2 text-sm" data-testid="demo-notice">
          Demo workshop — sample data, shared demo password.
        </p>
      ) : null}
      {password === "set" ? <p role="status" className="mb-4 text-sm text-moss">Your password is set. Sign in with it now.</p> : null}
      <SignInForm next={typeof next === "string" ? next : undefined} />
      <p className="mt-4 text-sm"><Link href="/reset-password">Forgot your password?</Link></p>
    </AuthCard>
  );
}
