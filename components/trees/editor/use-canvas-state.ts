"use client";
import { applyEdgeChanges, applyNodeChanges, type EdgeChange, type NodeChange } from "@xyflow/react";
import { useCallback, useEffect, useMemo, useState } from "react";
import type { TreeProblem } from "@/lib/diagnosis";
import type { DraftGraph } from "@/lib/trees/draft";
import { problemsByNode } from "@/lib/trees/problems";
import { reconcileEdges, reconcileNodes, type TreeFlowEdge, type TreeFlowNode } from "./flow-model";

/**
 * The canvas keeps its own node list (live drag positions, measured sizes, selection) and is
 * brought in line with the draft whenever the draft or its problems change.
 */
export function useCanvasState(draft: DraftGraph, problems: TreeProblem[], causeNameOf: ReadonlyMap<string, string>) {
  const problemMap = useMemo(() => problemsByNode(problems), [problems]);
  const problemOptions = useMemo(() => new Set(problems.flatMap((p) => (p.optionId ? [p.optionId] : []))), [problems]);
  const [nodes, setNodes] = useState<TreeFlowNode[]>(() => reconcileNodes([], draft, problemMap, causeNameOf));
  const [edges, setEdges] = useState<TreeFlowEdge[]>(() => reconcileEdges([], draft, problemOptions));

  // The canvas keeps its own node state (selection, drag positions, measured sizes); when the draft
  // changes it is merged in, not replaced, so xyflow keeps what it measured.
  // eslint-disable-next-line react-hooks/set-state-in-effect
  useEffect(() => { setNodes((prev) => reconcileNodes(prev, draft, problemMap, causeNameOf)); }, [draft, problemMap, causeNameOf]);
  // eslint-disable-next-line react-hooks/set-state-in-effect
  useEffect(() => { setEdges((prev) => reconcileEdges(prev, draft, problemOptions)); }, [draft, problemOptions]);

  // Removal goes through the draft (and its undo history), never straight to the canvas.
  const onNodesChange = useCallback((changes: NodeChange<TreeFlowNode>[]) => {
    setNodes((ns) => applyNodeChanges(changes.filter((c) => c.type !== "remove"), ns));
  }, []);
  const onEdgesChange = useCallback((changes: EdgeChange<TreeFlowEdge>[]) => {
    setEdges((es) => applyEdgeChanges(changes.filter((c) => c.type !== "remove"), es));
  }, []);

  const select = useCallback((nodeKey: string | null, edgeKey: string | null) => {
    setNodes((ns) => ns.map((n) => (n.selected === (n.id === nodeKey) ? n : { ...n, selected: n.id === nodeKey })));
    setEdges((es) => es.map((e) => (!!e.selected === (e.id === edgeKey) ? e : { ...e, selected: e.id === edgeKey })));
  }, []);

  return { nodes, edges, onNodesChange, onEdgesChange, select };
}
