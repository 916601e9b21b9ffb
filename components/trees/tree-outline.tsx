import type { TreeGraph } from "@/lib/trees/graph-types";
import { OPENING_CAUTION } from "@/lib/trees/caution";
import { KIND_LABELS } from "@/lib/trees/kinds";
import { STRENGTH_STEPS } from "./strength-steps";
import { percent } from "@/lib/format";

/** Nodes in the order a walk meets them (breadth first from the start), then any the walk never reaches. */
function walkOrder(graph: TreeGraph) {
  const byKey = new Map(graph.nodes.map((n) => [n.key, n]));
  const seen = new Set<string>();
  const order: TreeGraph["nodes"] = [];
  const queue = graph.rootKey && byKey.has(graph.rootKey) ? [graph.rootKey] : [];
  while (queue.length) {
    const key = queue.shift()!;
    if (seen.has(key)) continue;
    seen.add(key);
    order.push(byKey.get(key)!);
    for (const o of graph.options) if (o.fromKey === key && o.toKey && !seen.has(o.toKey)) queue.push(o.toKey);
  }
  return [...order, ...graph.nodes.filter((n) => !seen.has(n.key))];
}

/** A read-only view of a version for anyone who may read trees: what is asked, in order, and what each answer says. */
export function TreeOutline({ graph }: { graph: TreeGraph }) {
  const nodes = walkOrder(graph);
  const titleOf = new Map(graph.nodes.map((n) => [n.key, n.title || n.key]));
  const causeName = new Map(graph.causes.map((c) => [c.slug, c.name]));
  const total = graph.causes.reduce((s, c) => s + c.priorWeight, 0);
  return (
    <div className="flex flex-col gap-4" data-testid="tree-outline">
      <div>
        <h3 className="text-sm font-semibold">Causes and prior weights</h3>
        <ul className="mt-1 flex flex-wrap gap-2 text-xs">
          {graph.causes.map((c) => (
            <li key={c.slug} className="rounded border border-ink-faint/40 px-2 py-0.5">{c.name} <span className="font-mono text-ink-faint">{total ? percent(c.priorWeight / total) : "—"}</span></li>
          ))}
        </ul>
      </div>
      <ol className="flex flex-col gap-2">
        {nodes.map((n, i) => {
          const answers = graph.options.filter((o) => o.fromKey === n.key);
          return (
            <li key={n.key} id={`node-${n.key}`} className="rounded border border-ink-faint/30 p-3">
              <p className="text-xs uppercase tracking-wide text-ink-faint">{i + 1}. {KIND_LABELS[n.kind]}{n.key === graph.rootKey ? " · start" : ""}{n.kind === "check" ? ` · ${n.costMinutes} min` : ""}</p>
              <p className="font-medium">{n.title}</p>
              {n.prompt ? <p className="text-sm text-ink-soft">{n.prompt}</p> : null}
              {n.kind === "cause" && n.causeSlug ? <p className="text-sm text-moss">Finding: {causeName.get(n.causeSlug) ?? n.causeSlug}</p> : null}
              {n.kind === "caution" ? <p className="mt-1 rounded bg-amber-light p-2 text-sm">{n.cautionText}</p> : null}
              {n.needsOpening ? <p className="mt-1 rounded bg-amber-light p-2 text-xs">{OPENING_CAUTION}</p> : null}
              {answers.length ? (
                <ul className="mt-2 flex flex-col gap-1 text-sm">
                  {answers.map((o) => (
                    <li key={o.key} className="flex flex-wrap items-baseline gap-x-2">
                      <span>“{o.label}”</span>
                      <span className="text-ink-faint">→ {o.toKey ? <a href={`#node-${o.toKey}`}>{titleOf.get(o.toKey)}</a> : "end"}</span>
                      {Object.entries(o.evidence).map(([slug, s]) => (
                        <span key={slug} className="rounded bg-paper-deep px-1 text-xs" title={STRENGTH_STEPS[s].word}>
                          <span className="font-mono font-semibold">{STRENGTH_STEPS[s].symbol}</span> {causeName.get(slug) ?? slug}
                        </span>
                      ))}
                    </li>
                  ))}
                </ul>
              ) : null}
            </li>
          );
        })}
      </ol>
    </div>
  );
}
