import type { Theme } from "@/db/schema";
import type { DraftGraph } from "@/lib/trees/draft";
import type { CatalogueCause } from "./editor-context";

export interface TreeEditorProps {
  tree: { id: number; slug: string; symptom: string; title: string; description: string; scope: string[] };
  version: { id: number; number: number; state: "draft" | "published"; revision: number; editedAt: string; editedBy: string | null };
  graph: DraftGraph;
  catalogue: CatalogueCause[];
  readOnly: boolean;
  /** The person's theme: the canvas library's own parts (controls, minimap) follow it. */
  theme: Theme;
}
