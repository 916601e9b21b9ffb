"use client";
import { useState, useTransition } from "react";
import { recordFinding, type FindingSaved } from "@/app/(shop)/cases/[id]/bench/actions";
import { FormMessage } from "@/components/ui/form-message";
import { Panel } from "@/components/ui/panel";
import type { FindingResult } from "@/db/schema";
import type { BenchProgress, StageInfo } from "@/lib/bench/types";
import { Checklist } from "./checklist";
import { CompanionsCard } from "./companions-card";
import { RankingCard } from "./ranking-card";
import { RecordedList } from "./recorded-list";

async function uploadPhoto(caseId: number, photo: File): Promise<string> {
  const body = new FormData();
  body.set("file", photo);
  body.set("caseId", String(caseId));
  const response = await fetch("/api/uploads", { method: "POST", body });
  const json = (await response.json().catch(() => null)) as { id?: string; error?: string } | null;
  if (!response.ok || !json?.id) throw new Error(json?.error ?? `The photo upload failed (the server answered ${response.status}).`);
  return json.id;
}

/** The teardown checklist of one unit: record findings, watch the ranking and the minutes left, then finish. */
export function BenchScreen({ caseId, progress, stages, photos, canRecord, finish }: {
  caseId: number;
  progress: BenchProgress;
  stages: StageInfo[];
  photos: Record<string, string>;
  canRecord: boolean;
  /** The bench outcome form, filled in from the findings; shown when the technician finishes. */
  finish: React.ReactNode;
}) {
  const [state, setState] = useState<FindingSaved>(null);
  const [pending, startTransition] = useTransition();
  const [accepted, setAccepted] = useState<string[]>([]);
  const [finishing, setFinishing] = useState(false);

  function record(cause: string, result: FindingResult, photo: File | null) {
    startTransition(async () => {
      try {
        const form = new FormData();
        form.set("caseId", String(caseId));
        form.set("cause", cause);
        form.set("result", result);
        if (photo) form.set("photoId", await uploadPhoto(caseId, photo));
        setState(await recordFinding(null, form));
      } catch (error) {
        setState({ ok: false, status: 0, error: error instanceof Error ? error.message : "The finding was not saved." });
      }
    });
  }

  // Companions the technician chose go to the top of the checklist, in the order chosen.
  const pinned = accepted.flatMap((slug) => progress.checklist.filter((s) => s.cause === slug));
  const steps = [...pinned, ...progress.checklist.filter((s) => !accepted.includes(s.cause))];
  const stageName = new Map(stages.map((s) => [s.slug, s.name]));

  return (
    <div className="touch-targets grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="flex min-w-0 flex-col gap-6">
        <Panel title="Checklist">
          <div className="flex flex-col gap-3">
            <p className="text-sm text-ink-soft" data-testid="minutes-left">
              Expected minutes left: <span className="font-mono font-semibold text-ink">{Math.round(progress.expectedMinutesLeft)}</span>
              {progress.found.length ? " · a fault is found: finish, or look at what often comes with it while the unit is open." : ""}
            </p>
            <FormMessage state={state} />
            <Checklist steps={steps} pinned={accepted} stageName={stageName} canRecord={canRecord} busy={pending} onRecord={record} />
          </div>
        </Panel>
        <Panel title={`Recorded (${progress.ranking.filter((r) => r.result).length})`}>
          <RecordedList ranking={progress.ranking} photos={photos} canRecord={canRecord} busy={pending} onRecord={record} />
        </Panel>
      </div>
      <div className="flex min-w-0 flex-col gap-6">
        <Panel title="Ranking after the findings"><RankingCard ranking={progress.ranking} unlisted={progress.unlisted} /></Panel>
        <Panel title="While it is open">
          <CompanionsCard companions={progress.companions} accepted={accepted} onAccept={(c) => setAccepted((a) => (a.includes(c) ? a : [...a, c]))} />
        </Panel>
        <Panel title="Labour so far">
          <p className="text-sm" data-testid="labour-so-far">
            Opening and closing {progress.openStages.length} stage{progress.openStages.length === 1 ? "" : "s"} and the inspections done: <span className="font-mono">{progress.teardownMinutes}</span> min
            {progress.found.length ? <>; with the repair of what was found about <span className="font-mono">{progress.labourEstimate}</span> min.</> : "."}
          </p>
          {canRecord ? (
            finishing ? null : (
              <button type="button" data-testid="finish-bench" onClick={() => setFinishing(true)}
                className="mt-3 rounded-md bg-copper px-4 py-2 font-medium text-white hover:bg-copper-dark">
                Finish: fill in the bench outcome
              </button>
            )
          ) : null}
        </Panel>
      </div>
      {finishing ? (
        <div className="lg:col-span-2" data-testid="bench-finish">
          <Panel title="Bench outcome (check it, then save or close)">{finish}</Panel>
        </div>
      ) : null}
    </div>
  );
}
