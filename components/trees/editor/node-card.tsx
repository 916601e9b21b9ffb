"use client";
import { Handle, Position, type NodeProps } from "@xyflow/react";
import { memo } from "react";
import { NODE_HEIGHT, NODE_WIDTH } from "@/lib/trees/layout";
import { KIND_LABELS } from "@/lib/trees/kinds";
import type { TreeFlowNode } from "./flow-model";

const KIND_STYLE = {
  question: { band: "bg-ink text-paper", mark: "?" },
  check: { band: "bg-copper text-white", mark: "✓" },
  cause: { band: "bg-moss text-white", mark: "●" },
  caution: { band: "bg-amber text-white", mark: "!" },
} as const;

function subtitle(data: TreeFlowNode["data"]): string {
  const { node } = data;
  switch (node.kind) {
    case "question":
      return node.prompt || "No wording yet";
    case "check":
      return `${node.costMinutes} min${node.needsOpening ? " · opens the unit" : ""}${node.prompt ? ` · ${node.prompt}` : ""}`;
    case "cause":
      return data.causeName ?? "No cause linked";
    case "caution":
      return node.cautionText || "No caution text yet";
  }
}

function NodeCardInner({ data, selected }: NodeProps<TreeFlowNode>) {
  const { node, isRoot, problems } = data;
  const style = KIND_STYLE[node.kind];
  const ring = selected ? "ring-2 ring-copper ring-offset-1" : problems.length ? "ring-2 ring-danger" : "";
  return (
    <div
      className={`overflow-hidden rounded-md border border-ink-faint/60 bg-white text-left shadow-sm ${ring}`}
      style={{ width: NODE_WIDTH, minHeight: NODE_HEIGHT }}
      data-testid={`node-${node.key}`}
      data-kind={node.kind}
      data-problems={problems.length}
      title={problems.length ? problems.join("\n") : undefined}
    >
      <Handle type="target" position={Position.Top} className="h-2.5! w-2.5! border-ink-soft! bg-white!" />
      <div className={`flex items-center justify-between gap-2 px-2 py-0.5 text-[11px] font-semibold uppercase tracking-wide ${style.band}`}>
        <span><span aria-hidden="true">{style.mark}</span> {KIND_LABELS[node.kind]}{isRoot ? " · start" : ""}</span>
        {problems.length ? (
          <span className="rounded bg-danger px-1.5 text-[10px] normal-case text-white" data-testid="node-problem-badge">
            {problems.length} problem{problems.length === 1 ? "" : "s"}
          </span>
        ) : node.needsOpening ? <span className="rounded bg-white px-1 text-[10px] normal-case text-copper-dark">caution</span> : null}
      </div>
      <div className="px-2 py-1">
        <p className="truncate text-sm font-semibold text-ink">{node.title || "(untitled)"}</p>
        <p className="line-clamp-2 text-xs leading-snug text-ink-soft">{subtitle(data)}</p>
      </div>
      {node.kind !== "cause" ? <Handle type="source" position={Position.Bottom} className="h-2.5! w-2.5! border-copper! bg-copper!" /> : null}
    </div>
  );
}

export const NodeCard = memo(NodeCardInner);
