import { NextResponse } from "next/server";
import { causeOptions } from "@/lib/catalogue/queries";
import { route } from "@/lib/http/route";
import { versionFor } from "@/lib/trees/access";
import { graphToDraft } from "@/lib/trees/draft";
import { loadGraph } from "@/lib/trees/graph";
import { treeProblems } from "@/lib/trees/problems";

/** The graph of a tree's draft, or of `?version=N`, for the editor and viewers (SWR). */
export const GET = route<{ id: string }>("tree:read", async (request, { user, params }) => {
  const { tree, version } = await versionFor(user, params.id, request.nextUrl.searchParams.get("version"));
  const [graph, catalogue] = await Promise.all([loadGraph(version.id), causeOptions()]);
  const draft = graphToDraft(graph!);
  return NextResponse.json(
    {
      tree: { id: tree.id, slug: tree.slug, title: tree.title, symptom: tree.symptom },
      version: { id: version.id, number: version.number, state: version.state, revision: version.revision, editedAt: version.editedAt.toISOString() },
      graph: draft,
      problems: treeProblems(draft, catalogue),
    },
    { headers: { "cache-control": "no-store" } },
  );
});
