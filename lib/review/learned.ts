import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { cases, learnedLikelihoods } from "@/db/schema";
import { learnLikelihoods, type DxSettings } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { closedCasesOf, shopWeights } from "./closed-cases";

export type LikelihoodTable = NonNullable<DxSettings["likelihoods"]>;

/**
 * Learns the table of one published version again from its closed cases and the shop's strength
 * weights as this transaction sees them, and stores it. Called in the transaction of every change
 * to those inputs. The version's row is locked first and the inputs are read after: two writers
 * (two cases closing on one version, or a closing and a settings change) take turns, and the
 * second reads what the first committed, so neither stores a table that misses the other's change.
 */
export async function relearn(tx: Tx, versionId: number): Promise<void> {
  await tx.insert(learnedLikelihoods).values({ versionId, cases: 0, likelihoods: {} }).onConflictDoNothing();
  await tx.execute(sql`select 1 from learned_likelihoods where version_id = ${versionId} for update`);
  const graph = await loadGraph(versionId, tx);
  if (!graph) throw new AppError("not_found", "That tree version does not exist.");
  const closed = await closedCasesOf(versionId, tx);
  const { likelihoods } = learnLikelihoods(toDxTree(graph), closed, undefined, { weights: await shopWeights(tx) });
  await tx.update(learnedLikelihoods).set({ cases: closed.length, likelihoods, learnedAt: new Date() }).where(eq(learnedLikelihoods.versionId, versionId));
}

/** relearn for every version a case has been walked on, in version order (the order every such writer locks in). */
export async function relearnAll(tx: Tx): Promise<void> {
  const versions = await tx.selectDistinct({ id: cases.treeVersionId }).from(cases).orderBy(asc(cases.treeVersionId));
  for (const v of versions) await relearn(tx, v.id);
}

/**
 * Learns the tables a database migrated from before they were stored lacks: every version with a
 * closed case and no table, each in a transaction of its own. Run after the migrations.
 */
export async function relearnMissing(): Promise<number> {
  const missing = await db.execute<{ id: number }>(sql`
    select distinct c.tree_version_id as id from cases c
    where c.status = 'closed' and not exists (select 1 from learned_likelihoods l where l.version_id = c.tree_version_id)
    order by 1`);
  for (const v of missing) await db.transaction((tx) => relearn(tx, v.id));
  return missing.length;
}

/** The stored table of a version, or undefined before any case on it has closed. */
export async function storedLikelihoods(versionId: number): Promise<LikelihoodTable | undefined> {
  const [row] = await db.select({ likelihoods: learnedLikelihoods.likelihoods }).from(learnedLikelihoods).where(eq(learnedLikelihoods.versionId, versionId));
  return row?.likelihoods;
}
