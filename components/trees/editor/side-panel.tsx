"use client";
import { CausesPanel } from "./causes-panel";
import { useEditor } from "./editor-context";
import { NodeForm } from "./node-form";
import { OptionForm } from "./option-form";
import { ProblemsPanel } from "./problems-panel";

export type SideTab = "selection" | "causes" | "problems";

export function SidePanel({ tab, onTab }: { tab: SideTab; onTab: (t: SideTab) => void }) {
  const { focus, problems, draft, readOnly } = useEditor();
  const tabs: { id: SideTab; label: string }[] = [
    { id: "selection", label: "Selected" },
    { id: "causes", label: `Causes (${draft.causes.length})` },
    { id: "problems", label: `Problems (${problems.length})` },
  ];
  return (
    <aside className="flex min-h-0 flex-col rounded-lg border border-ink-faint/30 bg-white" aria-label="Details">
      <div role="tablist" className="flex border-b border-ink-faint/30">
        {tabs.map((t) => (
          <button key={t.id} role="tab" type="button" aria-selected={tab === t.id} onClick={() => onTab(t.id)}
            className={`flex-1 px-2 py-2 text-xs font-semibold ${tab === t.id ? "border-b-2 border-copper text-ink" : "text-ink-faint hover:text-ink"} ${t.id === "problems" && problems.length ? "text-danger" : ""}`}>
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" className="min-h-0 flex-1 overflow-y-auto p-3">
        {tab === "causes" ? <CausesPanel /> : tab === "problems" ? <ProblemsPanel /> :
          focus?.type === "node" ? <NodeForm key={focus.key} nodeKey={focus.key} /> :
          focus?.type === "option" ? <OptionForm key={focus.key} optionKey={focus.key} /> : (
            <div className="text-sm text-ink-soft">
              <p>Pick a node or an answer (the line between two nodes) to edit it.</p>
              {!readOnly ? (
                <ul className="mt-2 list-disc pl-4 text-xs text-ink-faint">
                  <li>Add nodes with the buttons above the canvas.</li>
                  <li>Drag from a node&apos;s lower handle to another node to add an answer leading there.</li>
                  <li>Delete removes the selection; Ctrl+Z and Ctrl+Shift+Z undo and redo; F fits the tree in view.</li>
                </ul>
              ) : null}
            </div>
          )}
      </div>
    </aside>
  );
}
