import type { WalkCase } from "@/lib/triage/walk-types";

/** Who is calling about what, in one calm line. */
export function WalkHeader({ kase }: { kase: WalkCase }) {
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div>
        <p className="font-mono text-sm text-ink-soft" data-testid="case-reference">{kase.reference}</p>
        <h1>{kase.symptom}</h1>
        <p className="text-ink-soft">{kase.treeTitle} · tree version {kase.treeVersionNumber}</p>
      </div>
      <dl className="grid grid-cols-[auto_auto] gap-x-3 text-sm">
        <dt className="text-ink-faint">Caller</dt><dd>{kase.callerName} ({kase.callerKind})</dd>
        <dt className="text-ink-faint">Contact</dt><dd>{[kase.phone, kase.email].filter(Boolean).join(" · ")}</dd>
        <dt className="text-ink-faint">Unit</dt><dd>{kase.familyLabel}{kase.serial ? ` · ${kase.serial}` : ""} · {kase.ridingUse}</dd>
      </dl>
    </div>
  );
}
