import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { acceptSuggestionAction, setLikelihoodModeAction } from "@/lib/review/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
const FILE = "app/(shop)/trees/[id]/actions.ts";
// DESIGN §2: editing trees (and so accepting evidence into a draft, and the likelihood setting) is senior and admin work.
const EDITORS: readonly Role[] = ["admin", "senior"];

export const rows: EntryPointRows = {
  actions: [
    {
      file: FILE, exportName: "acceptSuggestion", spec: acceptSuggestionAction as AnySpec, allowed: EDITORS,
      sample: () => ({ treeId: "999999", versionId: "999999", optionKey: "o-when-bumps", causeSlug: "mount-bolts-loose" }),
    },
    { file: FILE, exportName: "setLikelihoodMode", spec: setLikelihoodModeAction as AnySpec, allowed: EDITORS, sample: () => ({ treeId: "999999", mode: "learned" }) },
  ],
  routes: [],
};
