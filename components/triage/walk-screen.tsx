"use client";
import { useMemo, useState } from "react";
import { answerStep, undoStep } from "@/app/(shop)/triage/actions";
import { Panel } from "@/components/ui/panel";
import { rideAdvice } from "@/lib/triage/safety";
import { reachedCautions, type ViewNode, type ViewOption } from "@/lib/triage/walk-view";
import { walkPath } from "@/lib/diagnosis";
import { AnswerTrail } from "./answer-trail";
import { CausePanel } from "./cause-panel";
import { CautionNotes } from "./caution-notes";
import { FinishPanel } from "./finish-panel";
import { NotesBox } from "./notes-box";
import { PathEnd } from "./path-end";
import { QuestionCard } from "./question-card";
import { StopRidingBanner } from "./stop-riding-banner";
import type { WalkProps } from "@/lib/triage/walk-types";
import { useAnswerKeys } from "./use-answer-keys";
import { useStepRequests } from "./use-step-requests";
import { currentRanking, type WalkState } from "./walk-state";
import { WalkHeader } from "./walk-header";

export function WalkScreen({ kase, tree, causes, steps, startRanking }: WalkProps) {
  const [state, setState] = useState<WalkState>({ steps, startRanking });
  const requests = useStepRequests();
  const [error, setError] = useState<string | null>(null);
  const [focus, setFocus] = useState<string | null>(null);
  const [skipped, setSkipped] = useState<ReadonlySet<string>>(new Set());

  const nodeByKey = useMemo(() => new Map<string, ViewNode>(tree.nodes.map((n) => [n.key, n])), [tree.nodes]);
  const optionByKey = useMemo(() => new Map<string, ViewOption>(tree.options.map((o) => [o.key, o])), [tree.options]);
  const causeBySlug = useMemo(() => new Map(causes.map((c) => [c.slug, c])), [causes]);
  const nameOf = (slug: string) => causeBySlug.get(slug)?.name ?? slug;
  const titleOf = (key: string) => nodeByKey.get(key)?.title ?? key;
  const labelOf = (key: string) => optionByKey.get(key)?.label ?? key;

  const ranking = currentRanking(state);
  const answers = useMemo(() => state.steps.map((s) => ({ nodeId: s.nodeKey, optionId: s.optionKey })), [state.steps]);
  const walk = useMemo(() => walkPath(tree.dx, answers), [tree.dx, answers]);
  const answered = new Set(answers.map((a) => a.nodeId));
  const open = ranking.suggestions.filter((s) => !skipped.has(s.nodeId));

  let currentKey: string | null = focus && !answered.has(focus) ? focus : walk.current;
  if (currentKey && skipped.has(currentKey)) currentKey = open[0]?.nodeId ?? null;
  const current = currentKey ? nodeByKey.get(currentKey) ?? null : null;
  const currentOptions = current ? tree.options.filter((o) => o.fromKey === current.key) : [];
  const hasDontKnow = currentOptions.some((o) => o.dontKnow);

  const cautions = reachedCautions(walk.cautions, nodeByKey, tree.options);
  const advice = rideAdvice(ranking, (slug) => causeBySlug.get(slug)?.area, cautions);
  const cautionNodes = walk.cautions.map((k) => nodeByKey.get(k)).filter((n): n is ViewNode => !!n);

  const notSaved = (outcome: Error | { error?: string } | null, fallback: string) =>
    outcome instanceof Error ? `${fallback} The server could not be reached; try again.` : outcome?.error ?? fallback;

  function answer(option: ViewOption) {
    if (!current) return;
    const form = new FormData();
    form.set("caseId", String(kase.id));
    form.set("nodeId", String(current.id));
    form.set("optionId", String(option.id));
    requests.send(() => answerStep(null, form), (result) => {
      if (!(result instanceof Error) && result?.ok) {
        const { step, ranking: confirmed } = result.data;
        setState((s) => ({ ...s, steps: [...s.steps, { id: step.id, seq: step.seq, nodeKey: step.nodeKey, optionKey: step.optionKey, ranking: confirmed }] }));
        setFocus(null);
        setError(null);
      } else {
        setError(notSaved(result, "The answer was not saved."));
      }
    });
  }

  function undo() {
    const last = state.steps.at(-1);
    if (!last) return;
    const form = new FormData();
    form.set("caseId", String(kase.id));
    form.set("seq", String(last.seq));
    requests.send(() => undoStep(null, form), (result) => {
      if (!(result instanceof Error) && result?.ok) {
        const removed = result.data.removedSeq;
        setState((s) => {
          const remaining = s.steps.filter((step) => step.seq < removed);
          return { steps: remaining, startRanking: remaining.length ? s.startRanking : result.data.ranking };
        });
        setFocus(null);
        setError(null);
      } else {
        setError(notSaved(result, "The answer was not taken back."));
      }
    });
  }

  function skip() {
    if (!current || hasDontKnow) return;
    setSkipped((s) => new Set([...s, current.key]));
    setFocus(null);
  }

  useAnswerKeys({
    onNumber: (i) => { if (currentOptions[i]) answer(currentOptions[i]); },
    onSkip: current && !hasDontKnow ? skip : undefined,
    onUndo: undo,
  });

  return (
    <div className="touch-targets flex flex-col gap-5" data-testid="walk-screen" data-pending={requests.saving ? "yes" : "no"}>
      <WalkHeader kase={kase} />
      <StopRidingBanner advice={advice} />
      {error ? <p role="alert" data-testid="walk-error" className="rounded-md bg-danger-light p-3 text-danger">{error}</p> : null}
      <div className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-5">
          <CautionNotes cautions={cautionNodes} />
          {current ? (
            <QuestionCard node={current} options={currentOptions} disabled={requests.saving} jumped={!!focus && focus === current.key}
              onAnswer={answer} onSkip={hasDontKnow ? null : skip} />
          ) : (
            <PathEnd reached={walk.reachedCauseIds.map(nameOf)} skipped={skipped.size} onUnskip={() => setSkipped(new Set())} />
          )}
          <Panel title="Answers so far">
            <AnswerTrail steps={state.steps} titleOf={titleOf} labelOf={labelOf} onUndo={undo} disabled={requests.saving || state.steps.length === 0} saving={requests.saving} />
          </Panel>
          <Panel title="Notes"><NotesBox caseId={kase.id} initial={kase.notes} /></Panel>
        </div>
        <CausePanel ranking={ranking} currentKey={currentKey} nameOf={nameOf} titleOf={titleOf} labelOf={labelOf}
          onPick={(key) => { setFocus(key); setSkipped((s) => { const next = new Set(s); next.delete(key); return next; }); }} disabled={requests.saving} />
      </div>
      <Panel title="Finish the call">
        <FinishPanel caseId={kase.id} ranking={ranking} catalogue={causes} email={kase.email} disabled={requests.saving} />
      </Panel>
    </div>
  );
}
