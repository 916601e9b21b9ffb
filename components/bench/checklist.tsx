"use client";
import { percent } from "@/lib/format";
import type { FindingResult } from "@/db/schema";
import type { ChecklistStep } from "@/lib/bench/types";
import { FindingControls } from "./finding-controls";
import { StageHeader } from "./stage-header";

/** What is left to inspect, in the cheapest expected order, each stage opened where it is first needed. */
export function Checklist({ steps, pinned, stageName, canRecord, busy, onRecord }: {
  steps: ChecklistStep[];
  pinned: string[];
  stageName: ReadonlyMap<string, string>;
  canRecord: boolean;
  busy: boolean;
  onRecord: (cause: string, result: FindingResult, photo: File | null) => void;
}) {
  if (steps.length === 0) return <p className="text-sm text-ink-soft">Every listed inspection is recorded.</p>;
  return (
    <ol className="flex flex-col gap-4" data-testid="checklist">
      {steps.map((step, i) => (
        <li key={step.cause} data-testid="checklist-step" data-cause={step.cause}
          className={`flex flex-col gap-3 rounded-lg border p-3 ${i === 0 ? "border-copper bg-paper-deep/30" : "border-ink-faint/30"}`}>
          {step.opens.length ? <StageHeader stages={step.opens} /> : null}
          <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
            <p className="font-medium">
              <span className="mr-2 font-mono text-sm text-ink-soft">{i + 1}.</span>
              {step.name}
              {pinned.includes(step.cause) ? <span className="ml-2 rounded bg-moss-light px-1.5 py-0.5 text-xs text-moss">companion</span> : null}
            </p>
            <p className="text-xs text-ink-soft">
              in {stageName.get(step.stage) ?? step.stage} · {step.minutes} min · reached {percent(step.reachProbability)}
            </p>
          </div>
          {canRecord && i < 3 ? <FindingControls cause={step.cause} name={step.name} busy={busy} onRecord={onRecord} /> : null}
        </li>
      ))}
    </ol>
  );
}
