import type { OutcomeView } from "@/lib/outcomes/queries";
import { upgradeNamed } from "@/lib/survival/upgrades";
import { PhotoStrip } from "./photo-strip";

const when = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ");

/** The outcome as recorded, read-only (a closed case, or a reader without case:work). */
export function OutcomeSummary({ view }: { view: OutcomeView }) {
  const o = view.outcome;
  if (!o && view.causes.length === 0) return <p className="text-sm text-ink-faint">No bench outcome recorded.</p>;
  return (
    <dl className="grid gap-x-6 gap-y-3 text-sm md:grid-cols-[12rem_1fr]" data-testid="outcome-summary">
      <dt className="font-medium text-ink-soft">Confirmed cause(s)</dt>
      <dd>
        <ul>
          {view.causes.map((c) => <li key={c.id}>{c.name}{c.primary ? <span className="ml-2 rounded bg-copper-light px-1.5 text-xs">primary</span> : null}</li>)}
          {o?.otherCause ? (
            <li>{o.otherCause} <span className="text-ink-faint">(not in the catalogue)</span>
              {view.causes.every((c) => !c.primary) ? <span className="ml-2 rounded bg-copper-light px-1.5 text-xs">primary</span> : null}
            </li>
          ) : null}
        </ul>
      </dd>
      <dt className="font-medium text-ink-soft">Parts replaced</dt>
      <dd>{view.parts.length === 0 ? "None" : (
        <ul>{view.parts.map((p) => <li key={p.id}>{p.quantity} × {p.name} <span className="font-mono text-xs text-ink-faint">{p.sku}</span></li>)}</ul>
      )}</dd>
      <dt className="font-medium text-ink-soft">Upgrades fitted</dt>
      <dd>{view.upgradeKinds.length === 0 && !o?.upgrades ? "None" : (
        <>{view.upgradeKinds.map((k) => upgradeNamed(k)?.name ?? k).join("; ")}{view.upgradeKinds.length && o?.upgrades ? " · " : ""}{o?.upgrades}</>
      )}</dd>
      <dt className="font-medium text-ink-soft">Labour</dt>
      <dd>{o ? `${o.labourMinutes} min` : "—"}</dd>
      <dt className="font-medium text-ink-soft">Notes</dt>
      <dd className="whitespace-pre-wrap">{o?.notes || "—"}</dd>
      <dt className="font-medium text-ink-soft">Photos</dt>
      <dd><PhotoStrip caseId={view.caseId} photos={view.photos} editable={false} /></dd>
      {o ? (<><dt className="font-medium text-ink-soft">Recorded</dt><dd>{when(o.recordedAt)} UTC{o.recordedBy ? ` by ${o.recordedBy}` : ""}</dd></>) : null}
    </dl>
  );
}
