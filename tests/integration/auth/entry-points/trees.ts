import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import {
  createTreeAction, discardDraftAction, publishDraftAction, saveDraftAction, startDraftAction, updateTreeDetailsAction,
} from "@/lib/trees/actions";
import { importTreeAction } from "@/lib/trees/import";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// senior mechanics (and administrators) create, edit and publish trees; everyone reads published ones.
const EDITORS: readonly Role[] = ["admin", "senior"];
const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];
const FILE = "app/(shop)/trees/actions.ts";
const MISSING = 999_999;
let counter = 0;
const unique = () => `${Date.now().toString(36)}-${(counter++).toString(36)}`;

const details = { symptom: "Squeal on the first pedal stroke", title: "Squeal when setting off", description: "Role matrix sample." };
const sampleFile = () => JSON.stringify({
  format: "rootbench-tree", formatVersion: 1, slug: `matrix-${unique()}`, ...details, scope: [], rootKey: "q-1",
  causes: [{ cause: "some-cause", priorWeight: 1 }],
  nodes: [{ key: "q-1", kind: "question", title: "Squeal?", prompt: "Does it squeal?", position: { x: 0, y: 0 } }],
  options: [],
});

export const rows: EntryPointRows = {
  actions: [
    { file: FILE, exportName: "createTree", spec: createTreeAction as AnySpec, allowed: EDITORS, sample: () => ({ slug: `matrix-${unique()}`, ...details }) },
    { file: FILE, exportName: "importTree", spec: importTreeAction as AnySpec, allowed: EDITORS, sample: () => ({ file: sampleFile() }) },
    { file: FILE, exportName: "updateTreeDetails", spec: updateTreeDetailsAction as AnySpec, allowed: EDITORS, sample: () => ({ treeId: String(MISSING), ...details }) },
    {
      file: FILE, exportName: "saveDraft", spec: saveDraftAction as AnySpec, allowed: EDITORS,
      sample: () => ({ versionId: MISSING, revision: 1, graph: { rootKey: null, causes: [], nodes: [], options: [] } }),
    },
    { file: FILE, exportName: "publishDraft", spec: publishDraftAction as AnySpec, allowed: EDITORS, sample: () => ({ versionId: MISSING, revision: 1 }) },
    { file: FILE, exportName: "startDraft", spec: startDraftAction as AnySpec, allowed: EDITORS, sample: () => ({ treeId: String(MISSING) }) },
    { file: FILE, exportName: "discardDraft", spec: discardDraftAction as AnySpec, allowed: EDITORS, sample: () => ({ versionId: String(MISSING) }) },
  ],
  routes: [
    { file: "app/api/trees/[id]/route.ts", method: "GET", path: `/api/trees/${MISSING}`, params: { id: String(MISSING) }, allowed: ALL },
    { file: "app/api/trees/[id]/export/route.ts", method: "GET", path: `/api/trees/${MISSING}/export`, params: { id: String(MISSING) }, allowed: ALL },
  ],
};
