import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { saveOutcome } from "@/app/(shop)/cases/[id]/actions";
import { BenchScreen } from "@/components/bench/bench-screen";
import { OutcomeForm } from "@/components/outcomes/outcome-form";
import { StatusBadge } from "@/components/cases/status-badge";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { DEFER_TO_MAKER } from "@/lib/bench/cautions";
import { benchProgress } from "@/lib/bench/progress";
import { outcomeDraftFor } from "@/lib/bench/proposal";
import { loadBench } from "@/lib/bench/queries";
import { loadOutcomeCatalogue, loadOutcomeView } from "@/lib/outcomes/queries";

export const metadata: Metadata = { title: "Bench" };

export default async function BenchPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: raw } = await params;
  const user = await requireRole("case:read", `/cases/${raw}/bench`);
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const data = await loadBench(id);
  if (!data) notFound();
  const progress = benchProgress(data.inputs);
  const onBench = data.kase.status === "on_bench";
  const canRecord = onBench && may(user.role, "bench:record");

  let finish: React.ReactNode = null;
  if (canRecord && may(user.role, "case:work")) {
    const [catalogue, view] = await Promise.all([loadOutcomeCatalogue(), loadOutcomeView(id)]);
    const ranked = progress.ranking.slice(0, 5).flatMap((r) => data.inputs.causes.filter((c) => c.slug === r.slug).map((c) => c.id));
    finish = (
      <OutcomeForm caseId={id} causes={catalogue.causes} parts={catalogue.parts} ranked={ranked} action={saveOutcome}
        initial={outcomeDraftFor(view, progress, data.inputs.causes)} />
    );
  }

  return (
    <div className="flex flex-col gap-5" data-testid="bench-page">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm"><Link href={`/cases/${id}`}>{data.kase.reference}</Link> · {data.kase.familyLabel}</p>
          <h1 className="flex flex-wrap items-center gap-3">Bench: {data.kase.symptom} <StatusBadge status={data.kase.status} /></h1>
        </div>
      </div>
      <p role="note" className="rounded-md border-l-4 border-amber bg-amber-light px-3 py-2 text-sm">{DEFER_TO_MAKER}</p>
      {!onBench ? <p className="text-sm text-ink-soft">Findings are recorded while the unit is on the bench; this is the plan as it stands.</p> : null}
      <BenchScreen caseId={id} progress={progress} stages={data.inputs.stages} photos={data.photos} canRecord={canRecord} finish={finish} />
    </div>
  );
}
