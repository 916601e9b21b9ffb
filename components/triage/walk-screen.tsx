"use client";
import { startTransition, useMemo, useOptimistic, useState, useTransition } from "react";
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
import { currentRanking, optimisticWalk, type WalkState } from "./walk-state";
import { WalkHeader } from "./walk-header";

export function WalkScreen({ kase, tree, causes, settings, steps, startRanking }: WalkProps) {
  const [base, setBase] = useState<WalkState>({ steps, startRanking });
  const reducer = useMemo(() => optimisticWalk(tree.dx, settings), [tree.dx, settings]);
  const [state, change] = useOptimistic(base, reducer);
  const [pending, startAction] = useTransition();
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

  function answer(option: ViewOption) {
    if (pending || !current) return;
    setError(null);
    startAction(async () => {
      change({ type: "answer", nodeKey: current.key, optionKey: option.key });
      const form = new FormData();
      form.set("caseId", String(kase.id));
      form.set("nodeId", String(current.id));
      form.set("optionId", String(option.id));
      const result = await answerStep(null, form);
      // React's startTransition, not the hook's: the hook's would set pending again, an extra
      // render of the whole screen before this one. This update joins the running action, so the
      // confirmed step, pending and the optimistic state all change in one render.
      startTransition(() => {
        if (result?.ok) {
          const { step, ranking: confirmed } = result.data;
          setBase((b) => ({ ...b, steps: [...b.steps, { id: step.id, seq: step.seq, nodeKey: step.nodeKey, optionKey: step.optionKey, ranking: confirmed }] }));
          setFocus(null);
        } else {
          setError(result?.error ?? "The answer was not saved.");
        }
      });
    });
  }

  function undo() {
    const last = base.steps.at(-1);
    if (pending || !last) return;
    setError(null);
    startAction(async () => {
      change({ type: "undo" });
      const form = new FormData();
      form.set("caseId", String(kase.id));
      form.set("seq", String(last.seq));
      const result = await undoStep(null, form);
      startTransition(() => {
        if (result?.ok) {
          setBase((b) => {
            const remaining = b.steps.filter((s) => s.seq < result.data.removedSeq);
            return { steps: remaining, startRanking: remaining.length ? b.startRanking : result.data.ranking };
          });
          setFocus(null);
        } else {
          setError(result?.error ?? "The answer was not taken back.");
        }
      });
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
    <div className="touch-targets flex flex-col gap-5" data-testid="walk-screen" data-pending={pending ? "yes" : "no"}>
      <WalkHeader kase={kase} />
      <StopRidingBanner advice={advice} />
      {error ? <p role="alert" data-testid="walk-error" className="rounded-md bg-danger-light p-3 text-danger">{error}</p> : null}
      <div className="grid gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-5">
          <CautionNotes cautions={cautionNodes} />
          {current ? (
            <QuestionCard node={current} options={currentOptions} disabled={pending} jumped={!!focus && focus === current.key}
              onAnswer={answer} onSkip={hasDontKnow ? null : skip} />
          ) : (
            <PathEnd reached={walk.reachedCauseIds.map(nameOf)} skipped={skipped.size} onUnskip={() => setSkipped(new Set())} />
          )}
          <Panel title="Answers so far">
            <AnswerTrail steps={state.steps} titleOf={titleOf} labelOf={labelOf} onUndo={undo} disabled={pending || base.steps.length === 0} />
          </Panel>
          <Panel title="Notes"><NotesBox caseId={kase.id} initial={kase.notes} /></Panel>
        </div>
        <CausePanel ranking={ranking} currentKey={currentKey} nameOf={nameOf} titleOf={titleOf} labelOf={labelOf}
          onPick={(key) => { setFocus(key); setSkipped((s) => { const next = new Set(s); next.delete(key); return next; }); }} disabled={pending} />
      </div>
      <Panel title="Finish the call">
        <FinishPanel caseId={kase.id} ranking={ranking} catalogue={causes} email={kase.email} disabled={pending} />
      </Panel>
    </div>
  );
}
