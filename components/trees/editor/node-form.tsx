"use client";
import { DRAFT_LIMITS } from "@/lib/trees/draft";
import { OPENING_CAUTION } from "@/lib/trees/caution";
import { KIND_LABELS, PROMPT_LABELS, asksSomething } from "@/lib/trees/kinds";
import { addCauses, addOption, moveOption, removeNodes, setRoot, updateNode, updateOption } from "@/lib/trees/ops";
import { useEditor } from "./editor-context";
import { Checkbox, NumberInput, SmallButton, TextArea, TextInput } from "./inputs";

export function NodeForm({ nodeKey }: { nodeKey: string }) {
  const { draft, edit, readOnly, catalogue, setFocus, problems } = useEditor();
  const node = draft.nodes.find((n) => n.key === nodeKey);
  if (!node) return <p className="text-sm text-ink-faint">That node is gone.</p>;
  const set = (field: string, patch: Parameters<typeof updateNode>[2]) => edit((d) => updateNode(d, node.key, patch), `node:${node.key}:${field}`);
  const answers = draft.options.filter((o) => o.fromKey === node.key);
  const titleOf = new Map(draft.nodes.map((n) => [n.key, n.title || n.key]));
  const mine = problems.filter((p) => p.nodeId === node.key);
  const byArea = new Map<string, typeof catalogue>();
  for (const c of catalogue) if (c.active || c.slug === node.causeSlug) byArea.set(c.area, [...(byArea.get(c.area) ?? []), c]);

  return (
    <div className="flex flex-col gap-3" data-testid="node-form">
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-sm font-semibold">{KIND_LABELS[node.kind]} <code className="font-mono text-xs text-ink-faint">{node.key}</code></h3>
        {draft.rootKey === node.key ? <span className="rounded bg-ink px-2 py-0.5 text-xs text-paper">Tree starts here</span> :
          <SmallButton disabled={readOnly} onClick={() => edit((d) => setRoot(d, node.key))}>Start the tree here</SmallButton>}
      </div>
      {mine.length ? (
        <ul className="rounded border border-danger/40 bg-danger-light/50 p-2 text-xs text-danger" aria-label="Problems on this node">
          {mine.map((p, i) => <li key={i}>{p.message}</li>)}
        </ul>
      ) : null}
      <TextInput label="Title" value={node.title} maxLength={DRAFT_LIMITS.title} disabled={readOnly} onChange={(v) => set("title", { title: v })} />
      <TextArea label={PROMPT_LABELS[node.kind]} value={node.prompt} maxLength={DRAFT_LIMITS.prompt} disabled={readOnly} onChange={(v) => set("prompt", { prompt: v })} />
      {asksSomething(node.kind) ? (
        <div className="flex flex-wrap items-end gap-4">
          <NumberInput label="Cost in minutes" value={node.costMinutes} min={1} max={DRAFT_LIMITS.costMinutes} disabled={readOnly} onChange={(v) => set("cost", { costMinutes: Math.round(v) })} />
          <Checkbox label="Needs the unit opened" checked={node.needsOpening} disabled={readOnly} onChange={(v) => set("opening", { needsOpening: v })} />
        </div>
      ) : null}
      {node.needsOpening ? (
        <p className="rounded border border-amber/50 bg-amber-light p-2 text-xs text-ink" role="note" data-testid="opening-caution">
          <strong>Standing caution shown with this check:</strong> {OPENING_CAUTION}
        </p>
      ) : null}
      {node.kind === "cause" ? (
        <div className="flex flex-col gap-0.5">
          <label htmlFor={`cause-${node.key}`} className="text-xs font-medium text-ink-soft">Catalogue cause</label>
          <select
            id={`cause-${node.key}`}
            className="rounded border border-ink-faint/50 bg-white px-2 py-1.5 text-sm"
            value={node.causeSlug ?? ""}
            disabled={readOnly}
            onChange={(e) => {
              const slug = e.target.value || null;
              // Linking a cause also lists it among the tree's causes, as scoring needs.
              edit((d) => { const next = updateNode(d, node.key, { causeSlug: slug }); return slug ? addCauses(next, [slug]) : next; });
            }}
          >
            <option value="">— pick a cause —</option>
            {[...byArea].map(([area, list]) => (
              <optgroup key={area} label={area.replace("_", " ")}>
                {list.map((c) => <option key={c.slug} value={c.slug}>{c.name}{c.active ? "" : " (retired)"}</option>)}
              </optgroup>
            ))}
          </select>
        </div>
      ) : null}
      {node.kind === "caution" ? (
        <TextArea label="Caution text" rows={4} value={node.cautionText} maxLength={DRAFT_LIMITS.caution} disabled={readOnly} onChange={(v) => set("caution", { cautionText: v })} />
      ) : null}
      {node.kind !== "cause" ? (
        <div className="flex flex-col gap-1">
          <h4 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Answers ({answers.length})</h4>
          {answers.length === 0 ? <p className="text-xs text-ink-faint">Drag from the node&apos;s lower handle to another node, or add an answer here.</p> : null}
          <ol className="flex flex-col gap-1">
            {answers.map((o, i) => (
              <li key={o.key} className="flex items-center gap-1 text-xs">
                <button type="button" className="flex-1 truncate rounded border border-ink-faint/40 px-2 py-1 text-left hover:bg-paper" onClick={() => setFocus({ type: "option", key: o.key })}>
                  <span className="font-medium">{o.label || "(no label)"}</span>{o.dontKnow ? <span className="text-ink-faint"> · don&apos;t know</span> : null}
                  <span className="text-ink-faint"> → {o.toKey ? titleOf.get(o.toKey) ?? o.toKey : "leads nowhere"}</span>
                </button>
                <SmallButton disabled={readOnly || i === 0} title="Move up" onClick={() => edit((d) => moveOption(d, o.key, -1))}>↑</SmallButton>
                <SmallButton disabled={readOnly || i === answers.length - 1} title="Move down" onClick={() => edit((d) => moveOption(d, o.key, 1))}>↓</SmallButton>
              </li>
            ))}
          </ol>
          {!readOnly ? (
            <div className="flex gap-2">
              <SmallButton onClick={() => { const r = addOption(draft, node.key, null); edit(() => r.draft); setFocus({ type: "option", key: r.key }); }}>Add an answer</SmallButton>
              {asksSomething(node.kind) && !answers.some((o) => o.dontKnow) ? (
                <SmallButton onClick={() => { const r = addOption(draft, node.key, null, "Don't know"); edit(() => updateOption(r.draft, r.key, { dontKnow: true })); }}>Add “don&apos;t know”</SmallButton>
              ) : null}
            </div>
          ) : null}
        </div>
      ) : null}
      {!readOnly ? <div><SmallButton tone="danger" onClick={() => { edit((d) => removeNodes(d, [node.key])); setFocus(null); }}>Delete this node</SmallButton></div> : null}
    </div>
  );
}
