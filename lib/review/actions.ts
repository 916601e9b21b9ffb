import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { LIKELIHOOD_MODES, trees, treeVersions } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { startDraftAction } from "@/lib/trees/actions";
import { graphToDraft } from "@/lib/trees/draft";
import { loadGraph, writeGraph } from "@/lib/trees/graph";
import { setEvidence } from "@/lib/trees/ops";
import { reviewVersion } from "./review";
import { STRENGTH_LABELS } from "@/lib/trees/kinds";

const id = z.coerce.number({ error: "No id given." }).int().positive("No id given.");
const key = z.string().trim().min(1, "No answer given.").max(80);

export const acceptSuggestionInput = z.object({ treeId: id, versionId: id, optionKey: key, causeSlug: key });

export interface AcceptedSuggestion {
  treeId: number;
  draftVersionId: number;
  draftNumber: number;
}

/**
 * Writes the strength nearest the learned likelihood into the tree's draft (started from the latest
 * published version when there is none). The suggestion is recomputed here, never taken from the form.
 */
export const acceptSuggestionAction = defineAction({
  name: "review.accept",
  access: "tree:edit",
  input: acceptSuggestionInput,
  async run(input, ctx): Promise<{ ok: true; data: AcceptedSuggestion; message: string }> {
    const [version] = await db.select({ treeId: treeVersions.treeId, state: treeVersions.state }).from(treeVersions).where(eq(treeVersions.id, input.versionId)).limit(1);
    if (!version || version.treeId !== input.treeId) throw new AppError("not_found", "That tree version does not exist.");
    const review = await reviewVersion(input.versionId);
    const s = review.suggestions.find((x) => x.optionKey === input.optionKey && x.causeSlug === input.causeSlug);
    if (!s) throw new AppError("conflict", "The shop history no longer suggests a change to this answer; reload the page.");
    if (s.proposedStrength === s.currentStrength) throw new AppError("conflict", "No single strength on this answer comes nearer the shop history than the current one.");

    const started = await startDraftAction.run({ treeId: input.treeId }, ctx);
    const draftId = "ok" in started ? started.data.versionId : started.versionId;

    const draftNumber = await db.transaction(async (tx) => {
      const [draft] = await tx.select().from(treeVersions).where(eq(treeVersions.id, draftId)).for("update");
      if (!draft || draft.state !== "draft") throw new AppError("conflict", "The draft was published or discarded a moment ago; reload and try again.");
      const graph = await loadGraph(draft.id, tx);
      if (!graph?.options.some((o) => o.key === s.optionKey)) {
        throw new AppError("conflict", `The draft no longer has the answer “${s.optionLabel}”, so the suggestion cannot be applied to it.`);
      }
      if (!graph.causes.some((c) => c.slug === s.causeSlug)) {
        throw new AppError("conflict", `The draft no longer lists “${s.causeName}” among its causes.`);
      }
      await writeGraph(tx, draft.id, setEvidence(graphToDraft(graph), s.optionKey, s.causeSlug, s.proposedStrength));
      // A new revision, so an editor holding the draft open sees that it changed under it.
      await tx.update(treeVersions).set({ revision: draft.revision + 1, editedBy: ctx.user.id, editedAt: new Date() }).where(eq(treeVersions.id, draft.id));
      return draft.number;
    });
    return {
      ok: true,
      data: { treeId: input.treeId, draftVersionId: draftId, draftNumber },
      message: `Draft ${draftNumber}: “${s.optionLabel}” is now “${STRENGTH_LABELS[s.proposedStrength]}” for ${s.causeName}. Publish the draft to use it.`,
    };
  },
});

export const likelihoodModeInput = z.object({
  treeId: id,
  mode: z.enum(LIKELIHOOD_MODES, { error: "Choose authored or learned likelihoods." }),
});

/** The tree setting that makes triage score with the authored strengths or with learned likelihoods. */
export const setLikelihoodModeAction = defineAction({
  name: "review.setLikelihoodMode",
  access: "tree:edit",
  input: likelihoodModeInput,
  async run(input) {
    const updated = await db.update(trees).set({ likelihoodMode: input.mode }).where(eq(trees.id, input.treeId)).returning({ id: trees.id });
    if (!updated.length) throw new AppError("not_found", "That tree does not exist.");
    return {
      ok: true as const,
      data: { treeId: input.treeId, mode: input.mode },
      message: input.mode === "learned" ? "Triage on this tree now scores with the likelihoods learned from closed cases." : "Triage on this tree now scores with the authored strengths.",
    };
  },
});
