import { acceptSuggestion, setLikelihoodMode } from "@/app/(shop)/trees/[id]/actions";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { may } from "@/lib/auth/roles";
import { currentUser } from "@/lib/auth/session";
import { treeReview } from "@/lib/review/queries";
import { STRENGTH_LABELS } from "@/lib/trees/kinds";
import { AcceptSuggestionForm } from "./accept-form";
import { LikelihoodModeForm } from "./likelihood-mode-form";
import { SuggestionText } from "./suggestion-item";

const SHOWN = 12;

/**
 * Evidence review for the tree page: where the shop's closed cases disagree with the tree's
 * evidence (DESIGN §4, learning from outcomes), with one click to write the nearest strength into the draft.
 */
export async function EvidenceSuggestions({ treeId }: { treeId: number }) {
  const [user, review] = await Promise.all([currentUser(), treeReview(treeId)]);
  if (!review) return null;
  const editor = may(user?.role, "tree:edit");
  const published = review.published;
  return (
    <div id="evidence-review">
    <Panel title="Evidence review">
      <div className="flex flex-col gap-4" data-testid="evidence-suggestions">
        {editor ? (
          <LikelihoodModeForm treeId={treeId} mode={review.likelihoodMode} action={setLikelihoodMode} />
        ) : (
          <p className="text-sm text-ink-soft">Triage on this tree scores with {review.likelihoodMode === "learned" ? "likelihoods learned from closed cases" : "the strengths written in the tree"}.</p>
        )}
        {!published ? <EmptyState title="Nothing published yet.">Suggestions come from closed cases walked on a published version.</EmptyState> : (
          <>
            <p className="text-sm text-ink-soft">
              Learned from {published.cases} closed case{published.cases === 1 ? "" : "s"} walked on version {published.versionNumber}.
              An answer is flagged where the shop&apos;s history and the tree differ by more than 0.25 with at least 10 cases.
            </p>
            {review.suggestions.length === 0 ? <EmptyState title="The shop’s history agrees with the tree's evidence." /> : (
              <ul className="flex flex-col divide-y divide-ink-faint/20">
                {review.suggestions.slice(0, SHOWN).map((s) => {
                  const inDraft = s.draftStrength === s.proposedStrength && s.currentStrength !== s.proposedStrength;
                  return (
                    <li key={`${s.optionKey}|${s.causeSlug}`} className="flex flex-col gap-2 py-3" data-testid="suggestion">
                      <SuggestionText s={s} />
                      {!editor || s.proposedStrength === s.currentStrength ? null : inDraft ? (
                        <p className="text-sm text-moss">In draft {review.draft?.number}: “{STRENGTH_LABELS[s.proposedStrength]}”. Publish the draft to use it.</p>
                      ) : s.draftStrength === null ? (
                        <p className="text-sm text-ink-soft">The open draft no longer has this answer.</p>
                      ) : (
                        <AcceptSuggestionForm
                          treeId={treeId} versionId={s.versionId} optionKey={s.optionKey} causeSlug={s.causeSlug} action={acceptSuggestion}
                          label={`Use “${STRENGTH_LABELS[s.proposedStrength]}” in the draft`}
                        />
                      )}
                    </li>
                  );
                })}
              </ul>
            )}
            {review.suggestions.length > SHOWN ? <p className="text-xs text-ink-faint">{review.suggestions.length - SHOWN} smaller differences not shown.</p> : null}
          </>
        )}
      </div>
    </Panel>
    </div>
  );
}
