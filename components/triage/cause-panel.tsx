import { Panel } from "@/components/ui/panel";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { CauseRanking } from "./cause-ranking";
import { ConclusionNote } from "./conclusion-note";
import { NextQuestions } from "./next-questions";

const SHOWN_SUGGESTIONS = 3;

/** The right-hand column: the stop advice, the ranked causes and the best next questions. */
export function CausePanel({ ranking, currentKey, nameOf, titleOf, labelOf, onPick, disabled }: {
  ranking: StoredRanking;
  currentKey: string | null;
  nameOf: (slug: string) => string;
  titleOf: (key: string) => string;
  labelOf: (key: string) => string;
  onPick: (nodeKey: string) => void;
  disabled: boolean;
}) {
  return (
    <div className="flex flex-col gap-5">
      <ConclusionNote ranking={ranking} nameOf={nameOf} />
      <Panel title="Likely causes">
        <CauseRanking ranking={ranking} nameOf={nameOf} explainAnswer={(n, o) => `${titleOf(n)} → ${labelOf(o)}`} />
      </Panel>
      <Panel title="Ask next">
        <NextQuestions suggestions={ranking.suggestions.slice(0, SHOWN_SUGGESTIONS)} currentKey={currentKey}
          titleOf={titleOf} nameOf={nameOf} onPick={onPick} disabled={disabled} />
        <p className="mt-2 text-xs text-ink-soft">Ranked by expected information gain per minute of asking or checking. The tree&apos;s own order stays the default; these are a help.</p>
      </Panel>
    </div>
  );
}
