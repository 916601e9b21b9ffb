"use client";
import dynamic from "next/dynamic";
import type { TreeEditorProps } from "./editor-types";

// The canvas library is loaded by this route only, in its own chunk, and never rendered on the server.
const TreeEditor = dynamic(() => import("./tree-editor"), {
  ssr: false,
  loading: ({ error }) => (
    <div className="flex h-[560px] items-center justify-center rounded-lg border border-ink-faint/30 bg-paper text-sm text-ink-faint" data-testid="editor-loading">
      {error ? `The canvas failed to load: ${error.message}` : "Loading the canvas…"}
    </div>
  ),
});

export function EditorLoader(props: TreeEditorProps) {
  return <TreeEditor {...props} />;
}
