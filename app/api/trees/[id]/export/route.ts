import { NextResponse } from "next/server";
import { route } from "@/lib/http/route";
import { versionFor } from "@/lib/trees/access";
import { graphToTreeFile } from "@/lib/trees/file/convert";
import { loadGraph } from "@/lib/trees/graph";
import { treeDetail } from "@/lib/trees/queries";

/** A version as a tree file (lib/trees/file/format.md), downloaded as `<slug>-v<N>.json`. */
export const GET = route<{ id: string }>("tree:read", async (request, { user, params }) => {
  const { tree, version } = await versionFor(user, params.id, request.nextUrl.searchParams.get("version"));
  const [graph, detail] = await Promise.all([loadGraph(version.id), treeDetail(tree.id)]);
  const file = graphToTreeFile(
    { slug: tree.slug, symptom: tree.symptom, title: tree.title, description: tree.description || tree.title, scope: detail!.scope.map((s) => s.slug) },
    graph!,
  );
  return new NextResponse(`${JSON.stringify(file, null, 2)}\n`, {
    headers: {
      "content-type": "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="${tree.slug}-v${version.number}.json"`,
      "cache-control": "no-store",
    },
  });
});
