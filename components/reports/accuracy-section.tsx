import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import type { VersionAccuracy } from "@/lib/reports/accuracy";
import { CalibrationChart } from "./calibration-chart";
import { num, pct, whole } from "@/lib/format";
import { NumberTable } from "./number-table";

/** Top-1/top-3 hits, Brier score and log loss per tree version, and the calibration of the one chosen. */
export function AccuracySection({ accuracy, selectedVersionId, linkFor }: {
  accuracy: VersionAccuracy[];
  selectedVersionId: number | null;
  linkFor: (versionId: number) => string;
}) {
  if (accuracy.length === 0) {
    return (
      <Panel title="How well the trees predicted">
        <EmptyState title="No closed cases triaged on a tree in this period.">Imported records have no triage ranking and are not scored.</EmptyState>
      </Panel>
    );
  }
  const selected = accuracy.find((a) => a.versionId === selectedVersionId) ?? [...accuracy].sort((a, b) => b.scores.n - a.scores.n)[0];
  const bins = selected.scores.calibration.filter((b) => b.n > 0);
  return (
    <Panel title="How well the trees predicted">
      <p className="mb-3 text-sm text-ink-soft">
        The ranking at the end of phone triage against the primary cause confirmed at the bench (a cause the tree does not list counts as
        “none of the listed causes”). Top-1: the first-ranked cause was it; top-3: it was among the first three. Brier score (0 best, 2 worst)
        and log loss (0 best) also weigh how sure the tree was.
      </p>
      <NumberTable
        caption="Tree accuracy per version"
        testId="accuracy-table"
        rows={accuracy}
        rowKey={(a) => String(a.versionId)}
        columns={[
          { key: "tree", label: "Tree", cell: (a) => <Link href={`/trees/${a.treeId}`}>{a.treeTitle}</Link> },
          { key: "v", label: "Version", numeric: true, cell: (a) => a.versionNumber },
          { key: "n", label: "Cases", numeric: true, cell: (a) => whole.format(a.scores.n) },
          { key: "top1", label: "Top-1", numeric: true, cell: (a) => pct(a.scores.top1) },
          { key: "top3", label: "Top-3", numeric: true, cell: (a) => pct(a.scores.top3) },
          { key: "brier", label: "Brier", numeric: true, cell: (a) => num(a.scores.brier) },
          { key: "ll", label: "Log loss", numeric: true, cell: (a) => num(a.scores.logLoss) },
          {
            key: "cal", label: "Calibration",
            cell: (a) => (a.versionId === selected.versionId ? <span className="text-ink-faint">shown below</span> : <Link href={linkFor(a.versionId)} scroll={false}>show</Link>),
          },
        ]}
      />
      <h3 className="mt-5 font-medium" id="calibration">Calibration: {selected.treeTitle}, version {selected.versionNumber}</h3>
      <p className="mb-2 text-sm text-ink-soft">Cases grouped by the probability the tree gave its top cause. A well-calibrated tree is right about as often as it says.</p>
      <div className="grid gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <CalibrationChart points={bins.map((b) => ({ bin: `${Math.round(b.from * 100)}–${Math.round(b.to * 100)}\u00a0%`, n: b.n, predicted: b.meanPredicted * 100, observed: b.observed * 100 }))} />
        <NumberTable
          caption="Calibration table"
          testId="calibration-table"
          rows={selected.scores.calibration}
          rowKey={(b) => String(b.from)}
          columns={[
            { key: "bin", label: "Top probability", cell: (b) => `${Math.round(b.from * 100)}–${Math.round(b.to * 100)}\u00a0%` },
            { key: "n", label: "Cases", numeric: true, cell: (b) => b.n },
            { key: "p", label: "Mean predicted", numeric: true, cell: (b) => (b.n ? pct(b.meanPredicted) : "—") },
            { key: "o", label: "Confirmed", numeric: true, cell: (b) => (b.n ? pct(b.observed) : "—") },
          ]}
        />
      </div>
    </Panel>
  );
}
