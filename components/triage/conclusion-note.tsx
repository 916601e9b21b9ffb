import type { StoredRanking } from "@/lib/triage/ranking-types";
import { unlistedLeads } from "@/lib/triage/ranking";
import { percent } from "@/lib/format";

/** The stop rule's advice: keep asking, enough to conclude, or none of the listed causes fits. */
export function ConclusionNote({ ranking, nameOf }: { ranking: StoredRanking; nameOf: (slug: string) => string }) {
  const c = ranking.conclusion;
  if (unlistedLeads(ranking)) {
    return (
      <div role="status" data-testid="conclusion" data-kind="unlisted" className="rounded-lg border-2 border-ink bg-paper-deep p-4">
        <p className="text-lg font-semibold">None of the listed causes fits — bench diagnosis needed.</p>
        <p className="text-sm text-ink-soft">The answers leave {percent(ranking.unlisted)} on a cause this tree does not list. Book the unit in for the bench rather than quoting a repair.</p>
      </div>
    );
  }
  if (c.kind === "cause" && c.causeId) {
    return (
      <div role="status" data-testid="conclusion" data-kind="cause" className="rounded-lg border-2 border-moss bg-moss-light p-4">
        <p className="text-lg font-semibold">Enough to conclude: {nameOf(c.causeId)} ({percent(c.probability)}).</p>
        <p className="text-sm text-ink-soft">Either it reached the stop line or no question left would change the picture. You can still ask more.</p>
      </div>
    );
  }
  return (
    <div role="status" data-testid="conclusion" data-kind="continue" className="rounded-lg border border-ink-faint/40 bg-white p-4">
      <p className="font-medium">Keep asking: the leading cause is at {percent(c.probability)}.</p>
      <p className="text-sm text-ink-soft">The suggestions below are the questions most likely to settle it.</p>
    </div>
  );
}
