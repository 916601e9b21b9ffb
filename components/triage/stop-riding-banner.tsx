import type { RideAdvice } from "@/lib/triage/safety";

/** DESIGN §7: the prominent warning to tell the caller to stop riding. */
export function StopRidingBanner({ advice }: { advice: RideAdvice }) {
  if (!advice.stopRiding) return null;
  return (
    <div role="alert" data-testid="stop-riding" className="rounded-xl border-4 border-danger bg-danger-light p-5 text-ink">
      <p className="text-2xl font-bold text-danger">Advise the caller to stop riding</p>
      <p className="mt-1 text-lg">The answers point at a drive that can slip or jam: it can let go or lock under load and throw the rider. Tell them not to ride the bike until it has been checked.</p>
      <p className="mt-2 text-sm text-ink-soft">Shown because {advice.reasons.join("; and ")}.</p>
    </div>
  );
}
