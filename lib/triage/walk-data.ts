import "server-only";
import type { WalkProps } from "./walk-types";
import { answersOf, caseRanking } from "./answer";
import { causesBySlug } from "./catalogue";
import { loadCaseContext } from "./context";
import { caseHeader, caseStepRows } from "@/lib/cases/queries";
import type { StoredRanking } from "./ranking-types";
import { publishedTree } from "./tree-cache";

/** Everything the walk screen starts from: the case, its tree, the catalogue rows and the steps so far. */
export async function loadWalk(caseId: number): Promise<{ status: string; props: WalkProps } | null> {
  const [header, ctx, stepRows] = await Promise.all([caseHeader(caseId), loadCaseContext(caseId), caseStepRows(caseId)]);
  if (!header || !ctx) return null;
  const tree = await publishedTree(ctx.treeVersionId);
  const catalogue = await causesBySlug(tree.graph.causes.map((c) => c.slug));
  const keyOf = (s: { nodeId: number; optionId: number }) => ({
    nodeKey: tree.nodeById.get(s.nodeId)?.key ?? "", optionKey: tree.optionById.get(s.optionId)?.key ?? "",
  });
  const steps = stepRows.map((s) => ({ id: s.id, seq: s.seq, ...keyOf(s), ranking: s.ranking as StoredRanking }));
  const startRanking = caseRanking(tree, answersOf(tree, []), ctx);
  return {
    status: header.status,
    props: {
      kase: {
        id: header.id, reference: header.reference, callerName: header.callerName, callerKind: header.callerKind, phone: header.phone,
        email: header.email, familyLabel: header.familyLabel, serial: header.serial, ridingUse: header.ridingUse, symptom: header.symptom,
        treeTitle: header.treeTitle, treeVersionNumber: header.treeVersionNumber, notes: header.notes,
      },
      tree: {
        dx: tree.dx,
        nodes: tree.graph.nodes.map((n) => ({ id: n.id, key: n.key, kind: n.kind, title: n.title, prompt: n.prompt, costMinutes: n.costMinutes, needsOpening: n.needsOpening, causeSlug: n.causeSlug, cautionText: n.cautionText })),
        options: tree.graph.options.map((o) => ({ id: o.id, key: o.key, fromKey: o.fromKey, toKey: o.toKey, label: o.label, dontKnow: o.dontKnow })),
      },
      causes: [...catalogue.values()].map((c) => ({
        slug: c.slug, name: c.name, area: c.area, priceLowCents: c.priceLowCents, priceHighCents: c.priceHighCents, labourMinutes: c.labourMinutes, inspectMinutes: c.inspectMinutes,
      })),
      steps,
      startRanking,
    },
  };
}
