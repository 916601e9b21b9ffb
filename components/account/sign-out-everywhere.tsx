import { signOutEverywhere } from "@/app/(shop)/account/actions";

export function SignOutEverywhere({ sessions }: { sessions: number }) {
  return (
    <form action={signOutEverywhere} className="flex flex-wrap items-center gap-4">
      <p className="text-sm text-ink-soft">
        You are signed in at {sessions === 1 ? "one place (this browser)" : `${sessions} places, this browser included`}.
      </p>
      <button type="submit" className="rounded-md border border-ink-faint/50 px-3 py-2 hover:bg-paper-deep">Sign out everywhere</button>
    </form>
  );
}
