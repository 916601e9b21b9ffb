import { eq } from "drizzle-orm";
import { beforeAll, beforeEach } from "vitest";
import { executeAction } from "@/lib/actions/define";
import { createSession } from "@/lib/auth/session";
import type { SessionUser } from "@/lib/auth/session-user";
import { startCaseAction } from "@/lib/triage/start";
import { motorFamilies, trees, treeVersions } from "@/db/schema";
import { loadGraph } from "@/lib/trees/graph";
import { createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";

export async function familyId(slug: string): Promise<number> {
  const [row] = await db.select({ id: motorFamilies.id }).from(motorFamilies).where(eq(motorFamilies.slug, slug));
  return row.id;
}

export async function publishedVersion(treeSlug: string): Promise<number> {
  const [row] = await db.select({ id: treeVersions.id }).from(treeVersions).innerJoin(trees, eq(trees.id, treeVersions.treeId))
    .where(eq(trees.slug, treeSlug));
  return row.id;
}

/** Database ids of a node and one of its options, by their keys in the tree file. */
export async function idsOf(versionId: number, nodeKey: string, optionLabel?: string) {
  const graph = (await loadGraph(versionId))!;
  const node = graph.nodes.find((n) => n.key === nodeKey)!;
  const options = graph.options.filter((o) => o.fromKey === nodeKey);
  const option = optionLabel ? options.find((o) => o.label.startsWith(optionLabel))! : options[0];
  if (!node || !option) throw new Error(`no ${nodeKey} / ${optionLabel} in version ${versionId}`);
  return { nodeId: node.id, optionId: option.id, nodeKey: node.key, optionKey: option.key };
}

export async function startTestCase(user: SessionUser, overrides: Record<string, unknown> = {}) {
  const input = {
    callerName: "Fenna Waldrop", callerKind: "rider", phone: "+00 555 0100 2233", email: "fenna@example.test",
    familyId: await familyId("orvanta-tessel-2"), serial: "TS2-00417", ridingUse: "trail",
    treeVersionId: await publishedVersion("pedal-slip"), callerWords: "the pedals let go on a climb", ...overrides,
  };
  const result = await executeAction(startCaseAction, input, user);
  if (!result.ok) throw new Error(`start failed: ${JSON.stringify(result)}`);
  return result.data;
}

export interface PedalSlipFixture {
  tech: SessionUser;
  /** A session token of `tech`, for paths that read the cookie. */
  token: string;
  versionId: number;
  /** A fresh open case on the pedal-slip tree, started by `tech` before each test. */
  caseId: number;
}

/** Registers the usual hooks: the demo database and a technician once, a new pedal-slip case before each test. */
export function pedalSlipCase(): PedalSlipFixture {
  const fixture = {} as PedalSlipFixture;
  beforeAll(async () => {
    await resetToDemo();
    fixture.tech = await createUser("tech");
    fixture.token = (await createSession(fixture.tech.id)).token;
    fixture.versionId = await publishedVersion("pedal-slip");
  });
  beforeEach(async () => {
    fixture.caseId = (await startTestCase(fixture.tech)).id;
  });
  return fixture;
}
