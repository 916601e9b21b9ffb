import { Fragment } from "react";
import { STATUS_LABEL } from "@/components/cases/status-badge";
import { TriageSummary } from "@/components/cases/triage-summary";
import type { TeardownSummary } from "@/lib/bench/plan";
import type { CaseHeader } from "@/lib/cases/queries";
import { OPENING_CAUTION } from "@/lib/trees/caution";
import { QrCode } from "./qr-code";

const day = (d: Date | null) => (d ? d.toISOString().slice(0, 10) : "—");

/** A long address may wrap after a slash, never inside the case number. */
const breakAfterSlashes = (url: string) =>
  url.split("/").map((part, i, parts) => <Fragment key={i}>{part}{i < parts.length - 1 ? <>/<wbr /></> : null}</Fragment>);

/** One printed page that travels with the unit in its box; the QR code opens the case. */
export function JobCard({ kase, caseUrl, teardown, nameOf }: {
  kase: CaseHeader;
  /** The case's address from the app's configured public address, so the code opens the case from any device. */
  caseUrl: string;
  teardown: TeardownSummary | null;
  nameOf: (slug: string) => string;
}) {
  return (
    <article className="job-card flex flex-col gap-4 rounded-lg border border-ink-faint/30 bg-white p-6 text-ink" data-testid="job-card">
      <div className="flex flex-col gap-4 border-b-2 border-ink pb-4 sm:flex-row sm:items-start sm:justify-between sm:gap-6">
        <div className="min-w-0">
          <p className="text-sm uppercase tracking-wide text-ink-soft">Rootbench job card · {STATUS_LABEL[kase.status]}</p>
          <p className="whitespace-nowrap font-mono text-4xl font-bold tracking-tight sm:text-5xl" data-testid="job-card-reference">{kase.reference}</p>
          <p className="mt-1 text-lg">{kase.familyLabel}{kase.serial ? ` · serial ${kase.serial}` : ""}</p>
        </div>
        <figure className="flex shrink-0 flex-col items-center gap-1">
          <QrCode text={caseUrl} label={`QR code that opens case ${kase.reference}`} />
          <figcaption className="max-w-[48mm] text-center font-mono text-[10px] text-ink-soft">{breakAfterSlashes(caseUrl)}</figcaption>
        </figure>
      </div>

      <section className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[auto_1fr_auto_1fr]" aria-label="Caller and unit">
        <h2 className="sr-only">Caller and unit</h2>
        <dl className="contents">
          <dt className="text-ink-soft">Caller</dt><dd className="font-medium">{kase.callerName} ({kase.callerKind})</dd>
          <dt className="text-ink-soft">Contact</dt><dd>{[kase.phone, kase.email].filter(Boolean).join(" · ") || "—"}</dd>
          <dt className="text-ink-soft">Riding use</dt><dd>{kase.ridingUse}</dd>
          <dt className="text-ink-soft">Technician</dt><dd>{kase.technicianName ?? "—"}</dd>
          <dt className="text-ink-soft">Booked in</dt><dd>{day(kase.triagedAt)}</dd>
          <dt className="text-ink-soft">Tree</dt><dd>{kase.treeTitle}, version {kase.treeVersionNumber}</dd>
        </dl>
      </section>

      <section>
        <h2 className="text-base">Reported symptom</h2>
        <p className="text-lg font-medium">{kase.symptom}</p>
        {kase.notes ? <p className="whitespace-pre-wrap text-sm text-ink-soft">{kase.notes}</p> : null}
      </section>

      <section>
        <h2 className="text-base">At the end of the call</h2>
        <TriageSummary kase={kase} nameOf={nameOf} teardown={teardown} />
      </section>

      <section>
        <h2 className="text-base">What the caller sent</h2>
        <p className="text-sm">Asked for: {kase.whatToSend || "—"}</p>
        <p className="mt-2 text-sm">Arrived with (tick and note on arrival):</p>
        <ul className="mt-1 grid gap-1 text-sm sm:grid-cols-3">
          {["Drive unit", "Battery", "Charger", "Whole bike", "Keys", "Other:"].map((item) => (
            <li key={item} className="flex items-center gap-2"><span aria-hidden="true" className="inline-block size-4 border-2 border-ink" />{item}</li>
          ))}
        </ul>
      </section>

      <section className="rounded-md border-2 border-amber bg-amber-light p-3 text-sm" aria-label="Safety">
        <h2 className="text-base">Safety</h2>
        <p>{OPENING_CAUTION}</p>
      </section>
    </article>
  );
}
