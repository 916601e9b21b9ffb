import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { OutcomeSection } from "@/components/outcomes/outcome-section";
import { CaseMail } from "@/components/cases/case-mail";
import { CaseFollowUp } from "@/components/survival/case-follow-up";
import { EventList } from "@/components/cases/event-list";
import { StatusBadge, STATUS_LABEL } from "@/components/cases/status-badge";
import { StepList } from "@/components/cases/step-list";
import { TriageSummary } from "@/components/cases/triage-summary";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { teardownSummary } from "@/lib/bench/plan";
import { may } from "@/lib/auth/roles";
import { causesBySlug } from "@/lib/triage/catalogue";
import { caseEventRows, caseHeader, caseStepRows } from "@/lib/cases/queries";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { publishedTree } from "@/lib/triage/tree-cache";
import { caseMail } from "@/lib/mail/outbox";

export const metadata: Metadata = { title: "Case" };

export default async function CasePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ finished?: string }> }) {
  const { id: raw } = await params;
  const user = await requireRole("case:read", `/cases/${raw}`);
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const kase = await caseHeader(id);
  if (!kase) notFound();
  const [steps, events, mail, tree, { finished }] = await Promise.all([caseStepRows(id), caseEventRows(id), caseMail(id), publishedTree(kase.treeVersionId), searchParams]);
  const catalogue = await causesBySlug(tree.graph.causes.map((c) => c.slug));
  const nameOf = (slug: string) => catalogue.get(slug)?.name ?? slug;
  const titleOf = (key: string) => tree.nodeByKey.get(key)?.title ?? key;
  const teardown = await teardownSummary(kase);

  return (
    <div className="flex flex-col gap-6" data-testid="case-page">
      {finished ? (
        <p role="status" className="rounded-md bg-moss-light p-3 text-moss" data-testid="finished-note">
          Triage finished: the case is {STATUS_LABEL[kase.status]}.{mail.length ? " The summary e-mail is in the outbox." : ""}
        </p>
      ) : null}
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="font-mono text-sm text-ink-soft">{kase.reference}</p>
          <h1 className="flex items-center gap-3">{kase.symptom} <StatusBadge status={kase.status} /></h1>
          <p className="text-ink-soft">{kase.treeTitle} · tree version {kase.treeVersionNumber}</p>
        </div>
        {kase.status === "booked_in" || kase.status === "on_bench" ? (
          <Link href={`/cases/${kase.id}/job-card`} className="rounded-md border border-copper px-4 py-2 font-medium no-underline hover:bg-copper-light hover:no-underline" data-testid="job-card-link">Print the job card</Link>
        ) : null}
        {kase.status === "open" && may(user.role, "case:work") ? (
          <Link href={`/triage/${kase.id}`} className="rounded-md bg-copper px-4 py-2 font-medium text-white no-underline hover:bg-copper-dark hover:no-underline">Continue the walk</Link>
        ) : null}
      </div>

      <Panel title="Caller and unit">
        <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[auto_1fr_auto_1fr]">
          <dt className="text-ink-faint">Caller</dt><dd>{kase.callerName} ({kase.callerKind})</dd>
          <dt className="text-ink-faint">Contact</dt><dd>{[kase.phone, kase.email].filter(Boolean).join(" · ") || "—"}</dd>
          <dt className="text-ink-faint">Motor family</dt><dd>{kase.familyLabel}</dd>
          <dt className="text-ink-faint">Serial</dt><dd>{kase.serial || "—"}</dd>
          <dt className="text-ink-faint">Riding use</dt><dd>{kase.ridingUse}</dd>
          <dt className="text-ink-faint">Technician</dt><dd>{kase.technicianName ?? "—"}</dd>
          <dt className="text-ink-faint">Started</dt><dd>{kase.createdAt.toISOString().slice(0, 16).replace("T", " ")} UTC</dd>
          <dt className="text-ink-faint">Triage finished</dt><dd>{kase.triagedAt ? `${kase.triagedAt.toISOString().slice(0, 16).replace("T", " ")} UTC` : "—"}</dd>
        </dl>
      </Panel>

      <CaseFollowUp kase={kase} />

      {kase.triagedAt ? <Panel title="Triage result"><TriageSummary kase={kase} nameOf={nameOf} teardown={teardown} /></Panel> : null}

      {/* Bench outcome: the outcome form (confirmed causes, parts, upgrades, photos) mounts in this slot. */}
      <OutcomeSection caseId={kase.id} user={user} />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel title={`Answers (${steps.length})`}>
          <StepList nameOf={nameOf} titleOf={titleOf} steps={steps.map((s) => ({
            seq: s.seq, question: tree.nodeById.get(s.nodeId)?.title ?? "?", answer: tree.optionById.get(s.optionId)?.label ?? "?",
            by: s.answeredBy, at: s.answeredAt, ranking: s.ranking as StoredRanking,
          }))} />
        </Panel>
        <div className="flex flex-col gap-6">
          <Panel title="Notes">
            {kase.notes ? <p className="whitespace-pre-wrap text-sm" data-testid="case-notes-view">{kase.notes}</p> : <p className="text-sm text-ink-soft">No notes.</p>}
          </Panel>
          <Panel title="E-mails"><CaseMail messages={mail} canOpen={may(user.role, "outbox:read")} /></Panel>
          <Panel title="History"><EventList events={events} /></Panel>
        </div>
      </div>
    </div>
  );
}
