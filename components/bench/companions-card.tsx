import { percent } from "@/lib/format";
import type { CompanionSuggestion } from "@/lib/bench/types";

/** Causes inside the open stages that the shop often confirmed together with the leading one. */
export function CompanionsCard({ companions, accepted, onAccept }: {
  companions: CompanionSuggestion[];
  accepted: string[];
  onAccept: (cause: string) => void;
}) {
  if (companions.length === 0) {
    return <p className="text-sm text-ink-soft">Nothing stands out yet: suggestions appear once a stage is open and the shop&apos;s history links a cause inside it to the leading one.</p>;
  }
  return (
    <ul className="flex flex-col gap-3" data-testid="companions">
      {companions.map((c) => {
        const f = c.figures;
        return (
          <li key={c.cause} data-testid="companion" data-cause={c.cause} className="flex flex-col gap-1 border-b border-ink-faint/20 pb-3 last:border-b-0">
            <p className="text-sm font-medium">{c.name} <span className="font-normal text-ink-soft">· {c.inspectMinutes} min</span></p>
            <p className="text-xs text-ink-soft">
              With {c.givenName.toLowerCase()}: {f.together} of {f.givenCases} cases ({percent(f.share)}, 95 % interval {percent(f.interval.low)}–{percent(f.interval.high)}),
              {" "}{f.lift.toFixed(1)}× its usual {percent(f.baseRate)}.
            </p>
            {accepted.includes(c.cause) ? (
              <p className="text-xs font-medium text-moss">Added to the top of the checklist.</p>
            ) : (
              <button type="button" data-testid="accept-companion" onClick={() => onAccept(c.cause)}
                className="self-start rounded-md border border-copper px-3 py-1.5 text-sm font-medium text-copper-dark hover:bg-paper-deep">
                Look at it while it is open
              </button>
            )}
          </li>
        );
      })}
    </ul>
  );
}
