import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { currentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  if (await currentUser()) redirect("/");
  const { next } = await searchParams;
  return (
    <main className="grid min-h-screen place-items-center bg-ink px-4">
      <div className="w-full max-w-sm rounded-xl border-t-4 border-copper bg-paper p-8 shadow-xl">
        <h1 className="mb-1">Rootbench</h1>
        <p className="mb-6 text-sm text-ink-soft">Drive-unit triage and bench records. Sign in with your workshop account.</p>
        <SignInForm next={typeof next === "string" ? next : undefined} />
      </div>
    </main>
  );
}
