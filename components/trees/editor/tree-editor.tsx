"use client";
import "@xyflow/react/dist/style.css";
import "./canvas.css";
import {
  Background, Controls, MiniMap, ReactFlow, ReactFlowProvider, useNodesInitialized, useReactFlow,
  type Connection, type Edge, type OnSelectionChangeParams,
} from "@xyflow/react";
import { useRouter } from "next/navigation";
import { useCallback, useDeferredValue, useEffect, useMemo, useReducer, useRef, useState } from "react";
import useSWR from "swr";
import { publishDraft, saveDraft } from "@/app/(shop)/trees/actions";
import type { NodeKind } from "@/db/schema";
import type { ActionFailure } from "@/lib/actions/define";
import { fetcher } from "@/lib/fetcher";
import { treeGraphKey, type TreeGraphResponse } from "@/lib/trees/client";
import { staleDraftMessage } from "@/lib/trees/conflict";
import type { DraftGraph } from "@/lib/trees/draft";
import { draftToDxTree } from "@/lib/trees/dx";
import { graphToTreeFile } from "@/lib/trees/file/convert";
import { historyReducer, startHistory } from "@/lib/trees/history";
import { NODE_HEIGHT, NODE_WIDTH, autoLayout, freeSpot } from "@/lib/trees/layout";
import { addNode, addOption, moveNodes, removeNodes, removeOptions, updateOption } from "@/lib/trees/ops";
import { treeProblems } from "@/lib/trees/problems";
import { EditorContext, type EditorApi, type Focus } from "./editor-context";
import type { TreeEditorProps } from "./editor-types";
import type { TreeFlowEdge, TreeFlowNode } from "./flow-model";
import { NodeCard } from "./node-card";
import { ConflictBanner, SaveBar, type SaveStatus } from "./save-bar";
import { SidePanel, type SideTab } from "./side-panel";
import { CanvasToolbar } from "./toolbar";
import { useCanvasState } from "./use-canvas-state";

const NODE_TYPES = { treeNode: NodeCard };

declare global {
  interface Window {
    /** performance.now() when the canvas first showed every node fitted in view (read by the benchmark). */
    __rbCanvasReady?: number;
  }
}

export default function TreeEditor(props: TreeEditorProps) {
  return (
    <ReactFlowProvider>
      <Editor {...props} />
    </ReactFlowProvider>
  );
}

function failureText(result: ActionFailure): string {
  const fields = Object.entries(result.fieldErrors ?? {}).slice(0, 3).map(([k, v]) => `${k}: ${v}`);
  return fields.length ? `${result.error} ${fields.join("; ")}` : result.error;
}

const isTyping = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName));

function Editor({ tree, version, graph: initialGraph, catalogue, readOnly, theme }: TreeEditorProps) {
  const router = useRouter();
  const flow = useReactFlow<TreeFlowNode, TreeFlowEdge>();
  const wrapper = useRef<HTMLDivElement>(null);

  const [history, dispatch] = useReducer(historyReducer<DraftGraph>, initialGraph, startHistory);
  const draft = history.present;
  const lastCoalesce = useRef<string | null>(null);
  const edit = useCallback((update: (d: DraftGraph) => DraftGraph, coalesce?: string) => {
    if (readOnly) return;
    const record = !(coalesce && lastCoalesce.current === coalesce);
    lastCoalesce.current = coalesce ?? null;
    dispatch({ type: "apply", update, record });
  }, [readOnly]);
  const undo = useCallback(() => { lastCoalesce.current = null; dispatch({ type: "undo" }); }, []);
  const redo = useCallback(() => { lastCoalesce.current = null; dispatch({ type: "redo" }); }, []);

  const [saved, setSaved] = useState({ graph: initialGraph, revision: version.revision, at: version.editedAt });
  const revisionRef = useRef(version.revision);
  const dirty = !readOnly && draft !== saved.graph;
  const [saving, setSaving] = useState(false);
  const [publishing, setPublishing] = useState(false);
  const [status, setStatus] = useState<SaveStatus | null>(null);
  const [conflict, setConflict] = useState<string | null>(null);
  const [reloading, setReloading] = useState(false);

  const nameOf = useMemo(() => {
    const names = new Map(catalogue.map((c) => [c.slug, c.name]));
    return (slug: string) => names.get(slug) ?? slug;
  }, [catalogue]);
  const causeNames = useMemo(() => new Map(catalogue.map((c) => [c.slug, c.name])), [catalogue]);
  const inspectOf = useMemo(() => new Map(catalogue.map((c) => [c.slug, c.inspectMinutes])), [catalogue]);
  const checked = useDeferredValue(draft);
  const problems = useMemo(() => treeProblems(checked, catalogue), [checked, catalogue]);
  const dx = useMemo(() => draftToDxTree(checked, inspectOf), [checked, inspectOf]);

  const { nodes, edges, onNodesChange, onEdgesChange, select } = useCanvasState(draft, problems, causeNames);
  const [focus, setFocusState] = useState<Focus>(null);
  const [tab, setTab] = useState<SideTab>("selection");

  const setFocus = useCallback((next: Focus, opts?: { center?: boolean }) => {
    setFocusState(next);
    setTab("selection");
    select(next?.type === "node" ? next.key : null, next?.type === "option" ? next.key : null);
    if (opts?.center && next?.type === "node") {
      const node = flow.getNode(next.key);
      if (node) flow.setCenter(node.position.x + NODE_WIDTH / 2, node.position.y + NODE_HEIGHT / 2, { zoom: Math.max(flow.getZoom(), 0.9), duration: 250 });
    }
  }, [flow, select]);

  // Someone else's save shows up here (polled) before this editor tries to save over it.
  const { data: server } = useSWR<TreeGraphResponse>(readOnly ? null : treeGraphKey(tree.id), fetcher, {
    refreshInterval: 30_000, revalidateOnFocus: true, revalidateOnMount: false, dedupingInterval: 10_000,
  });
  const theirs = server && server.version.id === version.id && server.version.revision > saved.revision ? server : null;

  const save = useCallback(async (): Promise<boolean> => {
    if (readOnly || saving) return false;
    const graph = draft;
    setSaving(true);
    setStatus({ tone: "info", text: "Saving…" });
    const started = performance.now();
    const result = await saveDraft({ versionId: version.id, revision: revisionRef.current, graph });
    setSaving(false);
    if (result.ok) {
      revisionRef.current = result.data.revision;
      setSaved({ graph, revision: result.data.revision, at: result.data.editedAt });
      setStatus({ tone: result.data.problems.length ? "info" : "ok", text: result.message ?? "Saved." });
      wrapper.current?.setAttribute("data-last-save-ms", String(Math.round(performance.now() - started)));
      return true;
    }
    if (result.status === 409) setConflict(result.error);
    setStatus({ tone: "error", text: failureText(result) });
    return false;
  }, [draft, readOnly, saving, version.id]);

  const publish = useCallback(async (note: string) => {
    if (problems.length) return;
    setPublishing(true);
    if (dirty && !(await save())) { setPublishing(false); return; }
    const result = await publishDraft({ versionId: version.id, revision: revisionRef.current, note });
    if (!result.ok) {
      setPublishing(false);
      if (result.status === 409) setConflict(result.error);
      setStatus({ tone: "error", text: failureText(result) });
      return;
    }
    setStatus({ tone: "ok", text: result.message ?? "Published." });
    setSaved((s) => ({ ...s, graph: draft }));
    router.push(`/trees/${tree.id}?published=${result.data.number}`);
  }, [dirty, draft, problems.length, router, save, tree.id, version.id]);

  const reload = useCallback(async () => {
    setReloading(true);
    try {
      const fresh = await fetcher<TreeGraphResponse>(treeGraphKey(tree.id));
      if (fresh.version.id !== version.id) { router.refresh(); return; }
      revisionRef.current = fresh.version.revision;
      dispatch({ type: "reset", present: fresh.graph });
      setSaved({ graph: fresh.graph, revision: fresh.version.revision, at: fresh.version.editedAt });
      setConflict(null);
      setFocus(null);
      setStatus({ tone: "info", text: "Reloaded the draft as it is saved now." });
    } catch (error) {
      setStatus({ tone: "error", text: error instanceof Error ? error.message : "Could not reload." });
    } finally {
      setReloading(false);
    }
  }, [router, setFocus, tree.id, version.id]);

  const downloadMine = useCallback(() => {
    const file = graphToTreeFile({ slug: tree.slug, symptom: tree.symptom, title: tree.title, description: tree.description || tree.title, scope: tree.scope }, draft);
    const url = URL.createObjectURL(new Blob([JSON.stringify(file, null, 2)], { type: "application/json" }));
    const a = document.createElement("a");
    a.href = url;
    a.download = `${tree.slug}-my-edits.json`;
    a.click();
    URL.revokeObjectURL(url);
  }, [draft, tree]);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => { e.preventDefault(); };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  // First paint: once every node is measured, fit the tree in view and mark the canvas usable.
  const initialized = useNodesInitialized();
  const [ready, setReady] = useState(false);
  useEffect(() => {
    if (ready || (!initialized && nodes.length > 0)) return;
    const markReady = () => requestAnimationFrame(() => { window.__rbCanvasReady ??= performance.now(); setReady(true); });
    // fitView waits for measured nodes, so an empty tree is usable at once.
    if (nodes.length === 0) markReady();
    else void flow.fitView({ padding: 0.08 }).then(markReady);
  }, [flow, initialized, nodes.length, ready]);

  const fit = useCallback(() => { void flow.fitView({ padding: 0.08, duration: 200 }); }, [flow]);

  const addAtCentre = useCallback((kind: NodeKind) => {
    const rect = wrapper.current?.getBoundingClientRect();
    const centre = rect ? flow.screenToFlowPosition({ x: rect.left + rect.width / 2, y: rect.top + rect.height / 2 }) : { x: 0, y: 0 };
    const r = addNode(draft, kind, freeSpot(draft, { x: centre.x - NODE_WIDTH / 2, y: centre.y - NODE_HEIGHT / 2 }));
    edit(() => r.draft);
    setFocus({ type: "node", key: r.key });
  }, [draft, edit, flow, setFocus]);

  const layout = useCallback(() => {
    edit((d) => moveNodes(d, autoLayout(d)));
    requestAnimationFrame(() => requestAnimationFrame(fit));
  }, [edit, fit]);

  const selectedNodes = useMemo(() => nodes.filter((n) => n.selected).map((n) => n.id), [nodes]);
  const selectedEdges = useMemo(() => edges.filter((e) => e.selected).map((e) => e.id), [edges]);
  const deleteSelection = useCallback(() => {
    const optionKeys = selectedEdges.length || selectedNodes.length ? selectedEdges : focus?.type === "option" ? [focus.key] : [];
    if (!selectedNodes.length && !optionKeys.length) return;
    edit((d) => removeOptions(removeNodes(d, selectedNodes), optionKeys));
    setFocus(null);
  }, [edit, focus, selectedEdges, selectedNodes, setFocus]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const mod = e.ctrlKey || e.metaKey;
      if (mod && e.key.toLowerCase() === "s") { e.preventDefault(); void save(); return; }
      if (isTyping(e.target)) return;
      if (mod && e.key.toLowerCase() === "z") { e.preventDefault(); if (e.shiftKey) redo(); else undo(); return; }
      if (mod && e.key.toLowerCase() === "y") { e.preventDefault(); redo(); return; }
      if (!mod && !e.altKey && (e.key === "f" || e.key === "F")) { e.preventDefault(); fit(); return; }
      if (!readOnly && (e.key === "Delete" || e.key === "Backspace")) { e.preventDefault(); deleteSelection(); }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [deleteSelection, fit, readOnly, redo, save, undo]);

  const onConnect = useCallback((c: Connection) => {
    if (!c.source || !c.target || c.source === c.target) return;
    const r = addOption(draft, c.source, c.target);
    if (!r.key) return;
    edit(() => r.draft);
    setFocus({ type: "option", key: r.key });
  }, [draft, edit, setFocus]);

  const onReconnect = useCallback((old: Edge, c: Connection) => {
    if (!c.target || c.source !== old.source) return;
    edit((d) => updateOption(d, old.id, { toKey: c.target }));
  }, [edit]);

  const isValidConnection = useCallback((c: Connection | Edge) => {
    const from = draft.nodes.find((n) => n.key === c.source);
    return !!from && from.kind !== "cause" && c.source !== c.target;
  }, [draft.nodes]);

  const onSelectionChange = useCallback(({ nodes: ns, edges: es }: OnSelectionChangeParams) => {
    if (ns.length === 1 && es.length === 0) setFocusState((f) => (f?.type === "node" && f.key === ns[0].id ? f : { type: "node", key: ns[0].id }));
    else if (es.length === 1 && ns.length === 0) setFocusState((f) => (f?.type === "option" && f.key === es[0].id ? f : { type: "option", key: es[0].id }));
    else return;
    setTab("selection");
  }, []);

  const onNodeDragStop = useCallback((_e: unknown, _node: TreeFlowNode, dragged: TreeFlowNode[]) => {
    edit((d) => moveNodes(d, new Map(dragged.map((n) => [n.id, n.position]))));
  }, [edit]);

  const api: EditorApi = useMemo(() => ({ draft, readOnly, catalogue, nameOf, edit, focus, setFocus, problems, dx }),
    [draft, readOnly, catalogue, nameOf, edit, focus, setFocus, problems, dx]);

  return (
    <EditorContext.Provider value={api}>
      <div className="flex flex-col gap-3">
        {conflict ? <ConflictBanner message={conflict} onReload={reload} onDownload={downloadMine} reloading={reloading} /> : theirs ? (
          <ConflictBanner message={staleDraftMessage(null, new Date(theirs.version.editedAt))} onReload={reload} onDownload={downloadMine} reloading={reloading} />
        ) : null}
        <SaveBar number={version.number} revision={saved.revision} savedAt={saved.at} dirty={dirty} saving={saving} publishing={publishing}
          problemCount={problems.length} status={status} onSave={() => void save()} onPublish={(note) => void publish(note)} readOnly={readOnly} />
        <div className="grid min-h-0 gap-3 lg:grid-cols-[minmax(0,1fr)_360px]" style={{ height: "max(560px, calc(100vh - 230px))" }}>
          <div ref={wrapper} className="rb-canvas relative min-h-0 overflow-hidden rounded-lg border border-ink-faint/30 bg-paper"
            data-testid="tree-canvas" data-canvas-ready={ready ? "true" : "false"} data-node-count={nodes.length}>
            <ReactFlow<TreeFlowNode, TreeFlowEdge>
              nodes={nodes}
              edges={edges}
              nodeTypes={NODE_TYPES}
              onNodesChange={onNodesChange}
              onEdgesChange={onEdgesChange}
              onConnect={readOnly ? undefined : onConnect}
              onReconnect={readOnly ? undefined : onReconnect}
              isValidConnection={isValidConnection}
              onSelectionChange={onSelectionChange}
              onPaneClick={() => setFocusState(null)}
              onNodeDragStop={readOnly ? undefined : onNodeDragStop}
              nodesDraggable={!readOnly}
              nodesConnectable={!readOnly}
              edgesReconnectable={!readOnly}
              deleteKeyCode={null}
              minZoom={0.05}
              maxZoom={2}
              defaultEdgeOptions={{ type: "default" }}
              colorMode={theme}
            >
              <Background gap={24} color="var(--color-paper-deep)" />
              <Controls showInteractive={false} position="bottom-left" />
              <MiniMap pannable zoomable position="bottom-right" nodeColor={(n) => (n.data as TreeFlowNode["data"]).problems.length ? "var(--color-danger)" : "var(--color-ink-faint)"} />
            </ReactFlow>
            <div className="pointer-events-none absolute left-2 top-2 z-10">
              <div className="pointer-events-auto">
                <CanvasToolbar onAdd={addAtCentre} onLayout={layout} onFit={fit} onUndo={undo} onRedo={redo} onDelete={deleteSelection}
                  canUndo={history.past.length > 0} canRedo={history.future.length > 0}
                  canDelete={selectedNodes.length + selectedEdges.length > 0 || focus?.type === "option"} readOnly={readOnly} />
              </div>
            </div>
            {nodes.length === 0 ? (
              <div className="pointer-events-none absolute inset-0 flex items-center justify-center">
                <p className="rounded-md bg-white/90 px-4 py-3 text-sm text-ink-soft shadow-sm">An empty tree. Add a question to start from; the first node becomes the start.</p>
              </div>
            ) : null}
          </div>
          <SidePanel tab={tab} onTab={setTab} />
        </div>
      </div>
    </EditorContext.Provider>
  );
}
