"use client";
import { useEditor } from "./editor-context";

export function ProblemsPanel() {
  const { problems, setFocus, draft } = useEditor();
  const titleOf = new Map(draft.nodes.map((n) => [n.key, n.title || n.key]));
  if (problems.length === 0) {
    return <p className="rounded border border-moss/40 bg-moss-light p-3 text-sm text-moss" data-testid="no-problems">No problems. This draft can be published.</p>;
  }
  return (
    <div className="flex flex-col gap-2">
      <p className="text-xs text-ink-soft">Saving a draft with problems is fine; publishing waits until none is left. Pick one to go to its node.</p>
      <ul className="flex flex-col gap-1" data-testid="problem-list">
        {problems.map((p, i) => (
          <li key={i}>
            <button type="button" disabled={!p.nodeId && !p.optionId}
              className="w-full rounded border border-danger/30 bg-white px-2 py-1.5 text-left text-xs hover:bg-danger-light/40 disabled:cursor-default"
              onClick={() => p.optionId ? setFocus({ type: "option", key: p.optionId }) : p.nodeId ? setFocus({ type: "node", key: p.nodeId }, { center: true }) : undefined}>
              {p.nodeId ? <span className="font-semibold">{titleOf.get(p.nodeId) ?? p.nodeId}: </span> : null}
              <span className="text-ink-soft">{p.message}</span>
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}
