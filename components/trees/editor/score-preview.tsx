"use client";
import { useMemo } from "react";
import { scoreCauses, type DxTree } from "@/lib/diagnosis";
import { percentFine } from "@/lib/format";

/**
 * What the ranking would be after this one answer, next to the editor's priors. No shop history
 * is applied here, so the priors are the tree's own weights plus the unlisted share.
 */
export function ScorePreview({ dx, nodeKey, optionKey, nameOf }: {
  dx: DxTree;
  nodeKey: string;
  optionKey: string;
  nameOf: (slug: string) => string;
}) {
  const result = useMemo(() => {
    try {
      const before = scoreCauses(dx, []);
      const after = scoreCauses(dx, [{ nodeId: nodeKey, optionId: optionKey }]);
      return { before: new Map(before.causes.map((c) => [c.causeId, c.probability])), after, beforeUnlisted: before.unlisted };
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) };
    }
  }, [dx, nodeKey, optionKey]);

  if ("error" in result) return <p className="text-xs text-danger">No preview: {result.error}</p>;
  if (result.after.causes.length === 0) return <p className="text-xs text-ink-faint">Add causes to the tree to see a ranking.</p>;
  const rows = [...result.after.causes.map((c) => ({ id: c.causeId, name: nameOf(c.causeId), p: c.probability, before: result.before.get(c.causeId) ?? 0, out: c.probability === 0 })),
    { id: "__unlisted", name: "Not a listed cause", p: result.after.unlisted, before: result.beforeUnlisted, out: false }];
  return (
    <div data-testid="score-preview">
      <p className="mb-1 text-xs text-ink-soft">Ranking after this answer alone (bar), against the priors (tick):</p>
      <ol className="flex flex-col gap-1">
        {rows.map((r) => (
          <li key={r.id} className="text-xs">
            <div className="flex justify-between gap-2">
              <span className={`truncate ${r.out ? "text-ink-faint line-through" : "text-ink"}`}>{r.name}</span>
              <span className="shrink-0 font-mono">{r.out ? "ruled out" : percentFine(r.p)} <span className="text-ink-faint">({percentFine(r.before)})</span></span>
            </div>
            <div className="relative mt-0.5 h-1.5 rounded bg-paper-deep">
              <div className={`h-1.5 rounded ${r.id === "__unlisted" ? "bg-ink-faint" : "bg-copper"}`} style={{ width: `${r.p * 100}%` }} data-testid="score-bar" />
              <div className="absolute top-[-2px] h-2.5 w-0.5 bg-ink" style={{ left: `${r.before * 100}%` }} aria-hidden="true" />
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
