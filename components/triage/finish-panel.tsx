"use client";
import { useActionState, useMemo, useState } from "react";
import { finishCase } from "@/app/(shop)/triage/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/define";
import type { FinishedCase } from "@/lib/triage/finish";
import { benchPlanFor, QUOTE_MIN_PROBABILITY, roughQuote, type QuoteCause } from "@/lib/triage/quote";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { BATTERY_POST_WARNING, SEND_KINDS, SEND_LABELS, type SendKind } from "@/lib/triage/shipping";
import { money, percent } from "@/lib/format";

type Outcome = "booked_in" | "advised";

/** Ends the call: advised by phone, or booked in with a rough quote, the bench plan and what to send. */
export function FinishPanel({ caseId, ranking, catalogue, email, disabled }: {
  caseId: number;
  ranking: StoredRanking;
  catalogue: QuoteCause[];
  email: string;
  disabled: boolean;
}) {
  const [state, action] = useActionState<ActionState<FinishedCase>, FormData>(finishCase, null);
  const [outcome, setOutcome] = useState<Outcome>("booked_in");
  const [send, setSend] = useState<SendKind>("unit");
  const byslug = useMemo(() => new Map(catalogue.map((c) => [c.slug, c])), [catalogue]);
  const quote = useMemo(() => roughQuote(ranking, byslug), [ranking, byslug]);
  const plan = useMemo(() => benchPlanFor(ranking, byslug), [ranking, byslug]);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};

  return (
    <form action={action} className="flex flex-col gap-4" data-testid="finish-form">
      <input type="hidden" name="caseId" value={caseId} />
      <fieldset className="flex flex-wrap gap-2">
        <legend className="mb-1 text-sm font-medium text-ink-soft">How did the call end?</legend>
        {(["booked_in", "advised"] as const).map((o) => (
          <label key={o} className={`cursor-pointer rounded-lg border-2 px-4 py-2 ${outcome === o ? "border-copper bg-copper-light/50" : "border-ink-faint/40 bg-white"}`}>
            <input type="radio" name="outcome" value={o} checked={outcome === o} onChange={() => setOutcome(o)} className="mr-2" />
            {o === "booked_in" ? "Book the unit in" : "Advised by phone (fixed or no fault)"}
          </label>
        ))}
      </fieldset>

      {outcome === "booked_in" ? (
        <div className="grid gap-4 md:grid-cols-2">
          <div data-testid="quote">
            <h3 className="text-sm font-semibold text-ink-soft">Rough quote</h3>
            {quote ? (
              <>
                <p className="text-2xl font-semibold">{money(quote.lowCents)} – {money(quote.highCents)}</p>
                <p className="text-sm">About {quote.labourMinutes} min of labour.</p>
                <p className="mt-1 text-xs text-ink-soft">
                  Rule: the price bands and labour minutes of the causes at {QUOTE_MIN_PROBABILITY * 100} % or more
                  ({quote.basis.map((b) => `${b.name} ${percent(b.probability)}`).join(", ")}), each weighted by its
                  share of their probability, the band rounded out to €5. The top cause alone when none reaches {QUOTE_MIN_PROBABILITY * 100} %.
                </p>
              </>
            ) : <p className="text-sm text-ink-soft">No listed cause is left to quote from; quote the bench inspection only.</p>}
          </div>
          <div data-testid="bench-plan">
            <h3 className="text-sm font-semibold text-ink-soft">Bench plan</h3>
            <ol className="list-decimal pl-5 text-sm">
              {plan.order.slice(0, 6).map((slug) => (
                <li key={slug}>{byslug.get(slug)?.name ?? slug} <span className="text-ink-soft">({byslug.get(slug)?.inspectMinutes} min)</span></li>
              ))}
            </ol>
            {plan.order.length > 6 ? <p className="text-xs text-ink-soft">…and {plan.order.length - 6} less likely inspections.</p> : null}
            <p className="mt-1 text-sm">Expected teardown: about {Math.round(plan.expectedMinutes)} min.</p>
            <p className="text-xs text-ink-soft">Inspections in order of probability per inspection minute, which keeps the expected time lowest when one cause is at fault.</p>
          </div>
          <fieldset className="md:col-span-2">
            <legend className="mb-1 text-sm font-medium text-ink-soft">What must the caller send?</legend>
            <div className="flex flex-wrap gap-2">
              {SEND_KINDS.map((k) => (
                <label key={k} className={`cursor-pointer rounded-md border px-3 py-2 text-sm ${send === k ? "border-copper bg-copper-light/40" : "border-ink-faint/40 bg-white"}`}>
                  <input type="radio" name="send" value={k} checked={send === k} onChange={() => setSend(k)} className="mr-2" />
                  {SEND_LABELS[k]}
                </label>
              ))}
            </div>
            {send === "unit_battery" ? <p role="note" className="mt-2 rounded-md border-l-4 border-amber bg-amber-light p-3 text-sm">{BATTERY_POST_WARNING}</p> : null}
            {errors.send ? <p className="text-sm text-danger">{errors.send}</p> : null}
          </fieldset>
        </div>
      ) : null}

      <div className="flex flex-col gap-1">
        <label htmlFor="finish-advice" className="text-sm font-medium text-ink-soft">
          {outcome === "advised" ? "What you advised (goes into the e-mail)" : "Note for the caller (optional, goes into the e-mail)"}
        </label>
        <textarea id="finish-advice" name="advice" rows={3} aria-invalid={errors.advice ? true : undefined}
          className={`rounded-md border bg-white px-3 py-2 ${errors.advice ? "border-danger" : "border-ink-faint/50"}`} />
        {errors.advice ? <p className="text-sm text-danger">{errors.advice}</p> : null}
      </div>
      <p className="text-sm text-ink-soft">
        {email ? <>A summary goes to <strong>{email}</strong> through the outbox.</> : "No e-mail address on the case, so no summary is sent."}
      </p>
      <div className="flex items-center gap-4">
        <span className={disabled ? "pointer-events-none opacity-60" : ""}>
          <SubmitButton pendingText="Finishing…">{outcome === "booked_in" ? (email ? "Book in and send the summary" : "Book the unit in") : "Finish as advised"}</SubmitButton>
        </span>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
