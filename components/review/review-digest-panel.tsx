import Link from "next/link";
import { acceptSuggestion } from "@/app/(shop)/trees/[id]/actions";
import { STRENGTH_LABELS } from "@/lib/trees/kinds";
import { AcceptSuggestionForm } from "./accept-form";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { reviewDigest } from "@/lib/review/queries";
import { SuggestionText } from "./suggestion-item";

/**
 * The senior mechanic's home: the largest disagreements between the trees and the shop's history,
 * each with the same one-click accept as on the tree page (a senior may edit trees).
 */
export async function ReviewDigestPanel() {
  const { items, total } = await reviewDigest(4);
  return (
    <Panel title="Evidence review" actions={total > items.length ? <span className="text-xs text-ink-faint">{total} in all</span> : undefined}>
      {items.length === 0 ? <EmptyState title="The trees agree with the shop's closed cases." /> : (
        <ul className="flex flex-col divide-y divide-ink-faint/20" data-testid="review-digest">
          {items.map((s) => (
            <li key={`${s.versionId}|${s.optionKey}|${s.causeSlug}`} className="flex flex-col gap-1 py-2">
              <SuggestionText s={s} context={s.treeTitle} />
              <div className="flex flex-wrap items-center gap-3">
                {s.draftStrength === s.proposedStrength ? (
                  <span className="text-sm text-moss" data-testid="in-draft">In draft {s.draftNumber}: “{STRENGTH_LABELS[s.proposedStrength]}”.</span>
                ) : <AcceptSuggestionForm
                  treeId={s.treeId} versionId={s.versionId} optionKey={s.optionKey} causeSlug={s.causeSlug} action={acceptSuggestion}
                  label={`Use “${STRENGTH_LABELS[s.proposedStrength]}” in the draft`}
                />}
                <Link href={`/trees/${s.treeId}#evidence-review`} className="text-sm">Review on the tree</Link>
              </div>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
