"use client";
import Link from "next/link";
import { useActionState, useState } from "react";
import { commitPractice } from "@/app/(shop)/practice/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { PracticeReplay } from "@/lib/practice/types";
import { BenchResultPanel } from "./bench-result";
import { RankingBars } from "./ranking-bars";

function Caution({ text }: { text: string }) {
  return <p role="note" className="rounded-md border-l-4 border-amber bg-amber-light px-3 py-2 text-sm">{text}</p>;
}

/**
 * Walks a closed case: each recorded question, then what the caller said, one at a time, with the
 * engine's ranking after each answer. The trainee commits to a cause before the bench result shows.
 */
export function PracticeWalk({ replay }: { replay: PracticeReplay }) {
  const [startedAt] = useState(() => new Date().toISOString());
  const [answered, setAnswered] = useState(0);
  const [state, action] = useActionState(commitPractice, null);
  const result = state?.ok ? state.data : null;
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const total = replay.steps.length;
  const current = replay.steps[answered];
  const revealAll = !!result;
  const shown = revealAll ? total : answered;

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="flex min-w-0 flex-col gap-4">
        {replay.openingCautions.map((c) => <Caution key={c} text={c} />)}
        <ol className="flex flex-col gap-3" data-testid="practice-steps">
          {replay.steps.slice(0, shown).map((s) => (
            <li key={s.seq} className="rounded-lg border border-ink-faint/30 bg-white p-4">
              <p className="text-xs uppercase tracking-wide text-ink-faint">{s.kind === "check" ? "Check" : "Question"} {s.seq} of {total}</p>
              <p className="mt-1 font-medium">{s.title || s.prompt}</p>
              {s.title && s.prompt && s.prompt !== s.title ? <p className="text-sm text-ink-soft">{s.prompt}</p> : null}
              <p className="mt-2 text-copper-dark" data-testid="practice-answer">
                {s.dontKnow ? (s.kind === "check" ? "The check was not done." : "The caller did not know.")
                  : `${s.kind === "check" ? "The check showed" : "The caller said"}: “${s.answer}”`}
              </p>
              {s.cautions.map((c) => <div key={c} className="mt-2"><Caution text={c} /></div>)}
            </li>
          ))}
          {!revealAll && current ? (
            <li className="rounded-lg border-2 border-dashed border-copper/60 bg-white p-4" data-testid="practice-current">
              <p className="text-xs uppercase tracking-wide text-ink-faint">{current.kind === "check" ? "Check" : "Question"} {current.seq} of {total}</p>
              <p className="mt-1 text-lg font-medium">{current.title || current.prompt}</p>
              {current.title && current.prompt && current.prompt !== current.title ? <p className="text-sm text-ink-soft">{current.prompt}</p> : null}
              <p className="mt-2 text-sm text-ink-faint">What would you expect to hear? Think first, then reveal it.</p>
              <button
                type="button"
                onClick={() => setAnswered((n) => n + 1)}
                className="mt-3 rounded-md bg-ink px-4 py-2 font-medium text-paper hover:bg-ink-soft"
              >
                {current.kind === "check" ? "Show what the check showed" : "Show what the caller said"}
              </button>
            </li>
          ) : null}
        </ol>
        {!revealAll && answered === total ? (
          <p className="text-sm text-ink-soft" data-testid="practice-all-shown">That was the whole call. Commit to a cause to see what the bench found.</p>
        ) : null}
        {result ? <BenchResultPanel result={result} /> : null}
        {result ? <Link href="/practice" className="self-start">Practise another case →</Link> : null}
      </div>

      <aside className="flex flex-col gap-4 lg:sticky lg:top-4 lg:self-start">
        <section className="rounded-lg border border-ink-faint/30 bg-white p-4" aria-label="The engine's ranking">
          <h2 className="mb-1 text-base">The engine&apos;s ranking</h2>
          <p className="mb-3 text-xs text-ink-faint">after {shown} of {total} answers</p>
          <RankingBars ranking={replay.rankings[shown]} />
        </section>
        {!result ? (
          <form action={action} className="flex flex-col gap-2 rounded-lg border border-ink-faint/30 bg-white p-4" data-testid="practice-commit">
            <input type="hidden" name="caseId" value={replay.caseId} />
            <input type="hidden" name="revealedSteps" value={answered} />
            <input type="hidden" name="startedAt" value={startedAt} />
            <label htmlFor="practice-cause" className="font-semibold">Your call: what did the bench find?</label>
            <select
              id="practice-cause"
              name="cause"
              defaultValue=""
              aria-invalid={errors.cause ? true : undefined}
              className="rounded-md border border-ink-faint/50 bg-white px-2 py-2 text-sm"
            >
              <option value="" disabled>Pick a cause…</option>
              {replay.choices.map((c) => <option key={c.slug} value={c.slug}>{c.name}</option>)}
            </select>
            {errors.cause ? <p className="text-sm text-danger">{errors.cause}</p> : null}
            <p className="text-xs text-ink-faint">You may commit before every answer is shown; the bench result appears once you do.</p>
            <SubmitButton pendingText="Checking…">Commit to this cause</SubmitButton>
            <FormMessage state={state} />
          </form>
        ) : null}
      </aside>
    </div>
  );
}
