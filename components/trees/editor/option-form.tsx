"use client";
import { DRAFT_LIMITS } from "@/lib/trees/draft";
import { moveOption, removeOptions, setEvidence, updateOption } from "@/lib/trees/ops";
import { useEditor } from "./editor-context";
import { Checkbox, SmallButton, TextInput } from "./inputs";
import { ScorePreview } from "./score-preview";
import { StrengthLegend, StrengthPicker } from "./strength-picker";

export function OptionForm({ optionKey }: { optionKey: string }) {
  const { draft, edit, readOnly, nameOf, setFocus, dx, problems } = useEditor();
  const option = draft.options.find((o) => o.key === optionKey);
  if (!option) return <p className="text-sm text-ink-faint">That answer is gone.</p>;
  const from = draft.nodes.find((n) => n.key === option.fromKey);
  const mine = problems.filter((p) => p.optionId === option.key);
  return (
    <div className="flex flex-col gap-3" data-testid="option-form">
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-sm font-semibold">Answer <code className="font-mono text-xs text-ink-faint">{option.key}</code></h3>
        <SmallButton onClick={() => setFocus({ type: "node", key: option.fromKey }, { center: true })}>Back to “{from?.title ?? option.fromKey}”</SmallButton>
      </div>
      {mine.length ? (
        <ul className="rounded border border-danger/40 bg-danger-light/50 p-2 text-xs text-danger">{mine.map((p, i) => <li key={i}>{p.message}</li>)}</ul>
      ) : null}
      <TextInput label="Answer label" value={option.label} maxLength={DRAFT_LIMITS.label} disabled={readOnly}
        onChange={(v) => edit((d) => updateOption(d, option.key, { label: v }), `option:${option.key}:label`)} />
      <Checkbox label="“Don't know” (neutral for every cause)" checked={option.dontKnow} disabled={readOnly}
        onChange={(v) => edit((d) => updateOption(d, option.key, v ? { dontKnow: true, evidence: {} } : { dontKnow: false }))} />
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`to-${option.key}`} className="text-xs font-medium text-ink-soft">Leads to</label>
        <select id={`to-${option.key}`} className="rounded border border-ink-faint/50 bg-white px-2 py-1.5 text-sm" disabled={readOnly}
          value={option.toKey ?? ""} onChange={(e) => edit((d) => updateOption(d, option.key, { toKey: e.target.value || null }))}>
          <option value="">— nowhere (the walk ends) —</option>
          {draft.nodes.filter((n) => n.key !== option.fromKey).map((n) => <option key={n.key} value={n.key}>{n.title || n.key} ({n.kind})</option>)}
        </select>
      </div>
      <div className="flex gap-2">
        <SmallButton disabled={readOnly} onClick={() => edit((d) => moveOption(d, option.key, -1))}>Move up</SmallButton>
        <SmallButton disabled={readOnly} onClick={() => edit((d) => moveOption(d, option.key, 1))}>Move down</SmallButton>
        <SmallButton tone="danger" disabled={readOnly} onClick={() => { edit((d) => removeOptions(d, [option.key])); setFocus({ type: "node", key: option.fromKey }); }}>Delete answer</SmallButton>
      </div>

      <section aria-label="Evidence toward each cause" className="flex flex-col gap-2 border-t border-ink-faint/30 pt-3">
        <h4 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Evidence of this answer</h4>
        {draft.causes.length === 0 ? <p className="text-xs text-ink-faint">The tree lists no causes yet; add them in the Causes tab.</p> : (
          <>
            <StrengthLegend />
            {option.dontKnow ? <p className="text-xs text-ink-soft">A “don&apos;t know” answer changes nothing, so it carries no evidence.</p> : null}
            <ul className="flex flex-col gap-1">
              {draft.causes.map((c) => (
                <li key={c.slug} className="flex items-center justify-between gap-2">
                  <span className="truncate text-xs" title={c.slug}>{nameOf(c.slug)}</span>
                  <StrengthPicker cause={nameOf(c.slug)} value={option.evidence[c.slug] ?? "neutral"} disabled={readOnly || option.dontKnow}
                    onChange={(s) => edit((d) => setEvidence(d, option.key, c.slug, s))} />
                </li>
              ))}
            </ul>
          </>
        )}
      </section>
      {draft.causes.length && from && from.kind !== "cause" ? (
        <section className="border-t border-ink-faint/30 pt-3"><ScorePreview dx={dx} nodeKey={option.fromKey} optionKey={option.key} nameOf={nameOf} /></section>
      ) : null}
    </div>
  );
}
