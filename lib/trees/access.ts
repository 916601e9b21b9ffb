import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { trees, treeVersions } from "@/db/schema";
import { may } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";

/** Parses `[id]` and `?version=`: positive whole numbers or a 404. */
export function parseId(value: string | null | undefined): number | null {
  if (value === null || value === undefined || !/^\d{1,9}$/.test(value)) return null;
  const n = Number(value);
  return n > 0 ? n : null;
}

/**
 * The version a reader asked for. Without a number, editors get the draft (or the latest published
 * version) and everyone else the latest published one. Drafts are shown to editors only.
 */
export async function versionFor(user: SessionUser, treeIdParam: string, versionParam: string | null) {
  const treeId = parseId(treeIdParam);
  if (!treeId) throw new AppError("not_found", "That tree does not exist.");
  const [tree] = await db.select().from(trees).where(eq(trees.id, treeId)).limit(1);
  if (!tree) throw new AppError("not_found", "That tree does not exist.");
  const editor = may(user.role, "tree:edit");
  let version;
  if (versionParam !== null) {
    const number = parseId(versionParam);
    if (!number) throw new AppError("not_found", "That version does not exist.");
    [version] = await db.select().from(treeVersions).where(and(eq(treeVersions.treeId, treeId), eq(treeVersions.number, number))).limit(1);
  } else {
    const rows = await db.select().from(treeVersions).where(eq(treeVersions.treeId, treeId)).orderBy(desc(treeVersions.number));
    version = (editor ? rows.find((v) => v.state === "draft") : undefined) ?? rows.find((v) => v.state === "published");
  }
  if (!version) throw new AppError("not_found", "That version does not exist.");
  if (version.state === "draft" && !editor) throw new AppError("forbidden", "Drafts are open to senior mechanics and administrators only.");
  return { tree, version };
}
