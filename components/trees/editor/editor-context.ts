"use client";
import { createContext, useContext } from "react";
import type { DxTree, TreeProblem } from "@/lib/diagnosis";
import type { DraftGraph } from "@/lib/trees/draft";

export interface CatalogueCause {
  slug: string;
  name: string;
  area: string;
  inspectMinutes: number;
  active: boolean;
}

export type Focus = { type: "node"; key: string } | { type: "option"; key: string } | null;

export interface EditorApi {
  draft: DraftGraph;
  readOnly: boolean;
  catalogue: CatalogueCause[];
  nameOf: (slug: string) => string;
  /** Applies an edit as one undo step; edits with the same coalesce key in a row (typing) share one. */
  edit: (update: (draft: DraftGraph) => DraftGraph, coalesce?: string) => void;
  focus: Focus;
  setFocus: (focus: Focus, opts?: { center?: boolean }) => void;
  problems: TreeProblem[];
  dx: DxTree;
}

export const EditorContext = createContext<EditorApi | null>(null);

export function useEditor(): EditorApi {
  const api = useContext(EditorContext);
  if (!api) throw new Error("useEditor outside the tree editor");
  return api;
}
