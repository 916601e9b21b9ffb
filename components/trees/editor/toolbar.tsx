"use client";
import type { NodeKind } from "@/db/schema";
import { KIND_LABELS, NODE_KINDS } from "@/lib/trees/kinds";
import { SmallButton } from "./inputs";

export function CanvasToolbar({ onAdd, onLayout, onFit, onUndo, onRedo, onDelete, canUndo, canRedo, canDelete, readOnly }: {
  onAdd: (kind: NodeKind) => void;
  onLayout: () => void;
  onFit: () => void;
  onUndo: () => void;
  onRedo: () => void;
  onDelete: () => void;
  canUndo: boolean;
  canRedo: boolean;
  canDelete: boolean;
  readOnly: boolean;
}) {
  return (
    <div className="flex flex-wrap items-center gap-1 rounded-md border border-ink-faint/40 bg-white/95 p-1 shadow-sm" role="toolbar" aria-label="Canvas">
      {!readOnly ? (
        <>
          <span className="px-1 text-xs text-ink-faint">Add</span>
          {NODE_KINDS.map((kind) => <SmallButton key={kind} onClick={() => onAdd(kind)}>{KIND_LABELS[kind]}</SmallButton>)}
          <span className="mx-1 h-5 w-px bg-ink-faint/40" aria-hidden="true" />
          <SmallButton onClick={onLayout} title="Arrange every node top to bottom">Auto layout</SmallButton>
        </>
      ) : null}
      <SmallButton onClick={onFit} title="Zoom to fit (F)">Fit</SmallButton>
      {!readOnly ? (
        <>
          <SmallButton onClick={onUndo} disabled={!canUndo} title="Undo (Ctrl+Z)">Undo</SmallButton>
          <SmallButton onClick={onRedo} disabled={!canRedo} title="Redo (Ctrl+Shift+Z)">Redo</SmallButton>
          <SmallButton onClick={onDelete} disabled={!canDelete} tone="danger" title="Delete the selection (Delete)">Delete</SmallButton>
        </>
      ) : null}
    </div>
  );
}
