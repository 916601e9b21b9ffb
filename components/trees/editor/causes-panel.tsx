"use client";
import { useState } from "react";
import { addCauses, removeCause, setPriorWeight } from "@/lib/trees/ops";
import { DRAFT_LIMITS } from "@/lib/trees/draft";
import { useEditor } from "./editor-context";
import { NumberInput, SmallButton } from "./inputs";
import { percent } from "@/lib/format";

/** The tree's causes with the editor's prior weights (normalised to shares, DESIGN §4). */
export function CausesPanel() {
  const { draft, edit, readOnly, catalogue, nameOf } = useEditor();
  const [pick, setPick] = useState("");
  const total = draft.causes.reduce((s, c) => s + c.priorWeight, 0);
  const listed = new Set(draft.causes.map((c) => c.slug));
  const addable = catalogue.filter((c) => c.active && !listed.has(c.slug));
  const uses = (slug: string) => ({
    nodes: draft.nodes.filter((n) => n.causeSlug === slug).length,
    evidence: draft.options.filter((o) => slug in o.evidence).length,
  });
  return (
    <div className="flex flex-col gap-3" data-testid="causes-panel">
      <p className="text-xs text-ink-soft">Prior weights say how likely each cause is before any answer, relative to the others. The shop&apos;s confirmed bench history is added to them when a case is scored.</p>
      {draft.causes.length === 0 ? <p className="text-sm text-ink-faint">No causes yet.</p> : (
        <ul className="flex flex-col gap-2">
          {draft.causes.map((c) => {
            const u = uses(c.slug);
            return (
              <li key={c.slug} className="rounded border border-ink-faint/30 p-2">
                <div className="flex items-start justify-between gap-2">
                  <div>
                    <p className="text-sm font-medium">{nameOf(c.slug)}</p>
                    <p className="text-[11px] text-ink-faint">{u.nodes} cause node{u.nodes === 1 ? "" : "s"} · evidence on {u.evidence} answer{u.evidence === 1 ? "" : "s"}</p>
                  </div>
                  <SmallButton tone="danger" disabled={readOnly} title="Also removes the evidence that names it"
                    onClick={() => edit((d) => removeCause(d, c.slug))}>Remove</SmallButton>
                </div>
                <div className="mt-1 flex items-end gap-3">
                  <NumberInput label="Prior weight" value={c.priorWeight} min={0} max={DRAFT_LIMITS.priorWeight} step={0.5} disabled={readOnly}
                    onChange={(v) => edit((d) => setPriorWeight(d, c.slug, v), `prior:${c.slug}`)} />
                  <span className="pb-1.5 font-mono text-xs text-ink-soft">{total > 0 ? `${percent(c.priorWeight / total)} of the listed` : "—"}</span>
                </div>
              </li>
            );
          })}
        </ul>
      )}
      {!readOnly ? (
        <div className="flex items-end gap-2 border-t border-ink-faint/30 pt-3">
          <div className="flex flex-1 flex-col gap-0.5">
            <label htmlFor="add-cause" className="text-xs font-medium text-ink-soft">Add a catalogue cause</label>
            <select id="add-cause" className="rounded border border-ink-faint/50 bg-white px-2 py-1.5 text-sm" value={pick} onChange={(e) => setPick(e.target.value)}>
              <option value="">— pick —</option>
              {addable.map((c) => <option key={c.slug} value={c.slug}>{c.name}</option>)}
            </select>
          </div>
          <SmallButton tone="primary" disabled={!pick} onClick={() => { edit((d) => addCauses(d, [pick])); setPick(""); }}>Add</SmallButton>
        </div>
      ) : null}
    </div>
  );
}
