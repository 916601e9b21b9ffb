import type { TreeProblem } from "@/lib/diagnosis";
import type { DraftGraph } from "./draft";

/** What GET /api/trees/[id] answers. */
export interface TreeGraphResponse {
  tree: { id: number; slug: string; title: string; symptom: string };
  version: { id: number; number: number; state: "draft" | "published"; revision: number; editedAt: string };
  graph: DraftGraph;
  problems: TreeProblem[];
}

/** SWR keys, exported so any component can revalidate them. */
export const treeGraphKey = (treeId: number, version?: number) => `/api/trees/${treeId}${version ? `?version=${version}` : ""}`;

