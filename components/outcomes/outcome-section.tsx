import { saveOutcome, reopenCase, startBench } from "@/app/(shop)/cases/[id]/actions";
import { Panel } from "@/components/ui/panel";
import { may } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { loadOutcomeCatalogue, loadOutcomeView } from "@/lib/outcomes/queries";
import { outcomeLockedReason } from "@/lib/outcomes/status";
import { OutcomeForm } from "./outcome-form";
import { OutcomeSummary } from "./outcome-summary";
import { PhotoStrip } from "./photo-strip";
import { RepeatFlag } from "./repeat-flag";
import { ReopenForm, StartBenchForm } from "./status-forms";

const when = (d: Date) => d.toISOString().slice(0, 10);

/**
 * The bench outcome of a case: the form while the unit is on the bench, the frozen record once the
 * case is closed (with the reopen form for senior mechanics), the repeat-return flag in both.
 */
export async function OutcomeSection({ caseId, user }: { caseId: number; user: SessionUser }) {
  const view = await loadOutcomeView(caseId);
  if (!view) return null;
  const canWork = may(user.role, "case:work");
  const editable = canWork && outcomeLockedReason(view.status) === null;

  let body: React.ReactNode;
  if (editable) {
    const catalogue = await loadOutcomeCatalogue();
    const known = new Set(catalogue.causes.map((c) => c.id));
    const causes = [...catalogue.causes, ...view.causes.filter((c) => !known.has(c.id)).map((c) => ({ ...c, area: "other" }))];
    const idOfSlug = new Map(causes.map((c) => [c.slug, c.id]));
    const ranked = Object.entries(view.finalRanking ?? {})
      .filter(([slug, p]) => slug !== "unlisted" && p > 0)
      .sort((a, b) => b[1] - a[1])
      .slice(0, 5)
      .flatMap(([slug]) => (idOfSlug.has(slug) ? [idOfSlug.get(slug)!] : []));
    body = (
      <OutcomeForm
        caseId={view.caseId}
        causes={causes}
        parts={catalogue.parts}
        ranked={ranked}
        action={saveOutcome}
        photos={<PhotoStrip caseId={view.caseId} photos={view.photos} editable />}
        initial={{
          causes: view.causes.map((c) => ({ id: c.id, primary: c.primary })),
          otherCause: view.outcome?.otherCause ?? "",
          parts: view.parts.map((p) => ({ id: p.id, quantity: p.quantity })),
          upgrades: view.outcome?.upgrades ?? "",
          upgradeKinds: view.upgradeKinds,
          labourMinutes: view.outcome?.labourMinutes ?? 0,
          notes: view.outcome?.notes ?? "",
        }}
      />
    );
  } else if (view.status === "closed") {
    body = (
      <div className="flex flex-col gap-4">
        <p className="text-sm text-ink-soft">Closed: the outcome below is frozen.</p>
        <OutcomeSummary view={view} />
        {may(user.role, "case:reopen") ? <ReopenForm caseId={view.caseId} action={reopenCase} /> : null}
      </div>
    );
  } else if (view.status === "booked_in" && canWork) {
    body = (
      <div className="flex flex-col gap-3">
        <p className="text-sm text-ink-soft">The unit is booked in. When it is on the bench, record what you find here.</p>
        <StartBenchForm caseId={view.caseId} action={startBench} />
      </div>
    );
  } else {
    body = view.outcome ? <OutcomeSummary view={view} /> : <p className="text-sm text-ink-faint">{outcomeLockedReason(view.status)}</p>;
  }

  return (
    <Panel title="Bench outcome">
      <div className="touch-targets flex flex-col gap-4" data-testid="outcome-section">
        <RepeatFlag serial={view.serial} links={view.repeats} />
        {body}
        {view.reopenings.length ? (
          <div className="text-xs text-ink-faint">
            <p className="font-medium">Reopened</p>
            <ul>{view.reopenings.map((r, i) => <li key={i}>{when(r.at)}{r.by ? ` by ${r.by}` : ""}: {r.note}</li>)}</ul>
          </div>
        ) : null}
      </div>
    </Panel>
  );
}
