import type { GraphDiff } from "@/lib/trees/diff";
import { diffSize } from "@/lib/trees/diff";
import { KIND_LABELS } from "@/lib/trees/kinds";
import { STRENGTH_STEPS } from "./strength-steps";

function Section({ title, count, children }: { title: string; count: number; children: React.ReactNode }) {
  if (count === 0) return null;
  return (
    <section className="flex flex-col gap-1">
      <h3 className="text-sm font-semibold">{title} <span className="font-normal text-ink-faint">({count})</span></h3>
      <ul className="flex flex-col gap-1 text-sm">{children}</ul>
    </section>
  );
}

const Strength = ({ s }: { s: keyof typeof STRENGTH_STEPS }) => (
  <span className={`inline-block rounded border px-1 font-mono text-xs ${STRENGTH_STEPS[s].on}`}>{STRENGTH_STEPS[s].symbol} {STRENGTH_STEPS[s].word}</span>
);

/** A readable list of what changed between two versions; `titleOf` and `causeOf` name keys and slugs. */
export function DiffView({ diff, titleOf, causeOf }: { diff: GraphDiff; titleOf: (key: string) => string; causeOf: (slug: string) => string }) {
  if (diffSize(diff) === 0) {
    return <p className="text-sm text-ink-soft" data-testid="diff-empty">The two versions ask the same questions with the same evidence{diff.nodesMoved ? `; ${diff.nodesMoved} node(s) were only moved on the canvas` : ""}.</p>;
  }
  const change = (c: { field: string; before: string; after: string }, i: number) => (
    <li key={i} className="ml-4 text-xs text-ink-soft">{c.field}: <del className="text-danger">{c.before}</del> → <ins className="text-moss no-underline">{c.after}</ins></li>
  );
  return (
    <div className="flex flex-col gap-4" data-testid="diff-view">
      {diff.rootChanged ? (
        <p className="text-sm">
          {diff.rootChanged.after ? <>The tree starts at <strong>{titleOf(diff.rootChanged.after)}</strong></> : "The tree has no start node"}
          {diff.rootChanged.before ? <> instead of {titleOf(diff.rootChanged.before)}</> : null}.
        </p>
      ) : null}
      <Section title="Causes added" count={diff.causesAdded.length}>
        {diff.causesAdded.map((c) => <li key={c.slug} className="text-moss">+ {causeOf(c.slug)} <span className="text-ink-faint">(prior weight {c.priorWeight})</span></li>)}
      </Section>
      <Section title="Causes removed" count={diff.causesRemoved.length}>
        {diff.causesRemoved.map((c) => <li key={c.slug} className="text-danger">− {causeOf(c.slug)}</li>)}
      </Section>
      <Section title="Prior weights changed" count={diff.priorsChanged.length}>
        {diff.priorsChanged.map((c) => <li key={c.slug}>{causeOf(c.slug)}: {c.before} → {c.after}</li>)}
      </Section>
      <Section title="Nodes added" count={diff.nodesAdded.length}>
        {diff.nodesAdded.map((n) => <li key={n.key} className="text-moss">+ {KIND_LABELS[n.kind]} “{n.title}”</li>)}
      </Section>
      <Section title="Nodes removed" count={diff.nodesRemoved.length}>
        {diff.nodesRemoved.map((n) => <li key={n.key} className="text-danger">− {KIND_LABELS[n.kind]} “{n.title}”</li>)}
      </Section>
      <Section title="Nodes changed" count={diff.nodesChanged.length}>
        {diff.nodesChanged.map((n) => <li key={n.key}>{KIND_LABELS[n.kind]} “{n.title}”<ul>{n.changes.map(change)}</ul></li>)}
      </Section>
      <Section title="Answers added" count={diff.optionsAdded.length}>
        {diff.optionsAdded.map((o) => (
          <li key={o.key} className="text-moss">+ “{o.label}” on {titleOf(o.fromKey)} → {o.toKey ? titleOf(o.toKey) : "end"}
            {Object.entries(o.evidence).map(([slug, s]) => <span key={slug} className="ml-2 text-xs text-ink-soft"><Strength s={s} /> {causeOf(slug)}</span>)}
          </li>
        ))}
      </Section>
      <Section title="Answers removed" count={diff.optionsRemoved.length}>
        {diff.optionsRemoved.map((o) => <li key={o.key} className="text-danger">− “{o.label}” on {titleOf(o.fromKey)}</li>)}
      </Section>
      <Section title="Answers changed" count={diff.optionsChanged.length}>
        {diff.optionsChanged.map((o) => <li key={o.key}>“{o.label}” on {titleOf(o.fromKey)}<ul>{o.changes.map(change)}</ul></li>)}
      </Section>
      <Section title="Evidence changed" count={diff.evidenceChanged.length}>
        {diff.evidenceChanged.map((e, i) => (
          <li key={i}>“{e.label}” on {titleOf(e.fromKey)}, for {causeOf(e.cause)}: <Strength s={e.before} /> → <Strength s={e.after} /></li>
        ))}
      </Section>
      {diff.nodesMoved ? <p className="text-xs text-ink-faint">{diff.nodesMoved} node(s) also moved on the canvas.</p> : null}
    </div>
  );
}
