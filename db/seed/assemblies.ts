import { readFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";
import type { Tx } from "@/db";
import { ASSEMBLY_CAUTIONS, assemblies, causeLocations } from "@/db/schema";
import { slugSchema } from "@/lib/trees/file/schema";

const minutes = z.number().int().min(0).max(600);
const layoutSchema = z.strictObject({
  assemblies: z.array(z.strictObject({
    slug: slugSchema,
    name: z.string().min(1),
    parent: slugSchema.nullable(),
    openMinutes: minutes,
    closeMinutes: minutes,
    caution: z.enum(ASSEMBLY_CAUTIONS),
  })).min(1),
  locations: z.record(slugSchema, z.strictObject({ assembly: slugSchema, inspectMinutes: minutes })),
});
export const assembliesFileSchema = z.strictObject({
  format: z.literal("rootbench-assemblies"),
  formatVersion: z.literal(1),
  notes: z.string(),
  layouts: z.record(z.string(), layoutSchema),
  families: z.record(slugSchema, z.string()),
});
export type AssembliesFile = z.infer<typeof assembliesFileSchema>;

export function loadAssemblies(contentDir: string): AssembliesFile {
  return assembliesFileSchema.parse(JSON.parse(readFileSync(path.join(contentDir, "catalogue/assemblies.json"), "utf8")));
}

/** Each family's assemblies (parents before children, as listed) and where each cause is inspected. */
export async function seedAssemblies(
  tx: Tx,
  file: AssembliesFile,
  ids: { familyId: ReadonlyMap<string, number>; causeId: ReadonlyMap<string, number> },
): Promise<void> {
  for (const [familySlug, layoutName] of Object.entries(file.families)) {
    const familyId = ids.familyId.get(familySlug);
    const layout = file.layouts[layoutName];
    if (familyId === undefined || !layout) throw new Error(`assemblies.json: unknown family ${familySlug} or layout ${layoutName}`);
    const assemblyId = new Map<string, number>();
    for (const [position, a] of layout.assemblies.entries()) {
      const parentId = a.parent === null ? null : assemblyId.get(a.parent);
      if (parentId === undefined) throw new Error(`assemblies.json: ${layoutName}/${a.slug} is listed before its parent ${a.parent}`);
      const [row] = await tx.insert(assemblies).values({
        familyId, slug: a.slug, name: a.name, parentId, openMinutes: a.openMinutes, closeMinutes: a.closeMinutes, caution: a.caution, position,
      }).returning({ id: assemblies.id });
      assemblyId.set(a.slug, row.id);
    }
    const rows = Object.entries(layout.locations).map(([causeSlug, loc]) => {
      const causeId = ids.causeId.get(causeSlug);
      const where = assemblyId.get(loc.assembly);
      if (causeId === undefined || where === undefined) throw new Error(`assemblies.json: ${layoutName} locates unknown ${causeSlug} or ${loc.assembly}`);
      return { familyId, causeId, assemblyId: where, inspectMinutes: loc.inspectMinutes };
    });
    if (rows.length) await tx.insert(causeLocations).values(rows);
  }
}
