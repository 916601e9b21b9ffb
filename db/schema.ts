import { relations, sql } from "drizzle-orm";
import {
  type AnyPgColumn,
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  real,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from "drizzle-orm/pg-core";
import { ROLES, type Role } from "../lib/auth/roles";
import { STRENGTHS, type Strength } from "../lib/diagnosis/types";

const createdAt = () => timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const ts = (name: string) => timestamp(name, { withTimezone: true, mode: "date" });

export { ROLES, STRENGTHS, type Role };
const inList = (values: readonly string[]) => sql.raw(values.map((v) => `'${v}'`).join(", "));

/* ---------- people and sign-in ---------- */

export const THEMES = ["light", "dark"] as const;
export type Theme = (typeof THEMES)[number];

export const users = pgTable(
  "users",
  {
    id: text("id").primaryKey(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    role: text("role").$type<Role>().notNull(),
    passwordHash: text("password_hash").notNull(),
    active: boolean("active").notNull().default(true),
    /** The screen theme this person chose: the light palette or the high-contrast dark workshop one. */
    theme: text("theme").$type<Theme>().notNull().default("light"),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("users_email_key").on(t.email),
    check("users_role_check", sql`${t.role} in (${inList(ROLES)})`),
    check("users_theme_check", sql`${t.theme} in (${inList(THEMES)})`),
  ],
);
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;

/** Session ids are SHA-256 hashes of the cookie token; the token itself is never stored. */
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: text("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    expiresAt: ts("expires_at").notNull(),
    /** Sign-in time: a session ends at the absolute lifetime after it, however active. */
    createdAt: createdAt(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);
export type Session = typeof sessions.$inferSelect;

export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: serial("id").primaryKey(),
    email: text("email").notNull(),
    succeeded: boolean("succeeded").notNull(),
    ip: text("ip"),
    at: ts("at").notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_email_at_idx").on(t.email, t.at), index("sign_in_attempts_ip_at_idx").on(t.ip, t.at)],
);

export const ACCOUNT_TOKEN_PURPOSES = ["invite", "reset"] as const;
export type AccountTokenPurpose = (typeof ACCOUNT_TOKEN_PURPOSES)[number];
/** One-time links sent by e-mail (invitations, password resets); only the token's SHA-256 hash is stored. */
export const accountTokens = pgTable(
  "account_tokens",
  {
    id: text("id").primaryKey(),
    userId: text("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    purpose: text("purpose").$type<AccountTokenPurpose>().notNull(),
    expiresAt: ts("expires_at").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index("account_tokens_user_idx").on(t.userId),
    check("account_tokens_purpose_check", sql`${t.purpose} in (${inList(ACCOUNT_TOKEN_PURPOSES)})`),
  ],
);
export type AccountToken = typeof accountTokens.$inferSelect;

export const settings = pgTable("settings", {
  key: text("key").primaryKey(),
  value: jsonb("value").notNull(),
  updatedAt: ts("updated_at").notNull().defaultNow(),
});

/* ---------- catalogue ---------- */

export const motorMakers = pgTable(
  "motor_makers",
  {
    id: serial("id").primaryKey(),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    blurb: text("blurb").notNull().default(""),
  },
  (t) => [uniqueIndex("motor_makers_slug_key").on(t.slug)],
);
export type MotorMaker = typeof motorMakers.$inferSelect;

export const motorFamilies = pgTable(
  "motor_families",
  {
    id: serial("id").primaryKey(),
    makerId: integer("maker_id").notNull().references(() => motorMakers.id),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    generation: text("generation").notNull().default(""),
    years: text("years").notNull().default(""),
    notes: text("notes").notNull().default(""),
  },
  (t) => [uniqueIndex("motor_families_slug_key").on(t.slug), index("motor_families_maker_idx").on(t.makerId)],
);
export type MotorFamily = typeof motorFamilies.$inferSelect;

export const parts = pgTable(
  "parts",
  {
    id: serial("id").primaryKey(),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    sku: text("sku").notNull(),
    unitPriceCents: integer("unit_price_cents").notNull().default(0),
  },
  (t) => [
    uniqueIndex("parts_slug_key").on(t.slug),
    uniqueIndex("parts_sku_key").on(t.sku),
    check("parts_price_check", sql`${t.unitPriceCents} >= 0`),
  ],
);
export type Part = typeof parts.$inferSelect;

export const CAUSE_AREAS = [
  "clutch", "bearing", "seal", "drive_train", "sensor", "electronics", "cable", "firmware", "housing", "other",
] as const;
export type CauseArea = (typeof CAUSE_AREAS)[number];

export const causes = pgTable(
  "causes",
  {
    id: serial("id").primaryKey(),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    area: text("area").$type<CauseArea>().notNull(),
    description: text("description").notNull().default(""),
    inspectMinutes: integer("inspect_minutes").notNull().default(15),
    labourMinutes: integer("labour_minutes").notNull().default(60),
    priceLowCents: integer("price_low_cents").notNull().default(0),
    priceHighCents: integer("price_high_cents").notNull().default(0),
    ratingNm: integer("rating_nm"),
    active: boolean("active").notNull().default(true),
  },
  (t) => [
    uniqueIndex("causes_slug_key").on(t.slug),
    check("causes_area_check", sql`${t.area} in (${inList(CAUSE_AREAS)})`),
    check("causes_minutes_check", sql`${t.inspectMinutes} > 0 and ${t.labourMinutes} >= 0`),
    check("causes_price_check", sql`${t.priceLowCents} >= 0 and ${t.priceHighCents} >= ${t.priceLowCents}`),
  ],
);
export type Cause = typeof causes.$inferSelect;

export const causeParts = pgTable(
  "cause_parts",
  {
    causeId: integer("cause_id").notNull().references(() => causes.id, { onDelete: "cascade" }),
    partId: integer("part_id").notNull().references(() => parts.id),
    quantity: integer("quantity").notNull().default(1),
  },
  (t) => [primaryKey({ columns: [t.causeId, t.partId] }), check("cause_parts_qty_check", sql`${t.quantity} > 0`)],
);

/* ---------- symptom trees ---------- */

/** "auto": learned once the published version has enough closed cases, else authored; the other two are pinned by a senior. */
export const LIKELIHOOD_MODES = ["auto", "authored", "learned"] as const;
export const trees = pgTable(
  "trees",
  {
    id: serial("id").primaryKey(),
    slug: text("slug").notNull(),
    symptom: text("symptom").notNull(),
    title: text("title").notNull(),
    description: text("description").notNull().default(""),
    likelihoodMode: text("likelihood_mode").$type<(typeof LIKELIHOOD_MODES)[number]>().notNull().default("auto"),
    archived: boolean("archived").notNull().default(false),
    createdBy: text("created_by").references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("trees_slug_key").on(t.slug),
    check("trees_likelihood_mode_check", sql`${t.likelihoodMode} in (${inList(LIKELIHOOD_MODES)})`),
  ],
);
export type Tree = typeof trees.$inferSelect;

export const treeScope = pgTable(
  "tree_scope",
  {
    treeId: integer("tree_id").notNull().references(() => trees.id, { onDelete: "cascade" }),
    familyId: integer("family_id").notNull().references(() => motorFamilies.id),
  },
  (t) => [primaryKey({ columns: [t.treeId, t.familyId] }), index("tree_scope_family_idx").on(t.familyId)],
);

export const VERSION_STATES = ["draft", "published"] as const;
export type VersionState = (typeof VERSION_STATES)[number];

/**
 * A tree's graph lives in versions. At most one draft per tree; published versions are frozen
 * by database triggers (see the custom migration), so cases walked on them never change.
 */
export const treeVersions = pgTable(
  "tree_versions",
  {
    id: serial("id").primaryKey(),
    treeId: integer("tree_id").notNull().references(() => trees.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    state: text("state").$type<VersionState>().notNull().default("draft"),
    rootKey: text("root_key"),
    revision: integer("revision").notNull().default(1),
    basedOnVersionId: integer("based_on_version_id"),
    editedBy: text("edited_by").references(() => users.id),
    editedAt: ts("edited_at").notNull().defaultNow(),
    publishedBy: text("published_by").references(() => users.id),
    publishedAt: ts("published_at"),
    note: text("note").notNull().default(""),
  },
  (t) => [
    uniqueIndex("tree_versions_number_key").on(t.treeId, t.number),
    uniqueIndex("tree_versions_one_draft_key").on(t.treeId).where(sql`${t.state} = 'draft'`),
    check("tree_versions_state_check", sql`${t.state} in (${inList(VERSION_STATES)})`),
  ],
);
export type TreeVersion = typeof treeVersions.$inferSelect;

/**
 * What triage scores a published version with when it uses learned likelihoods: the table learned
 * from the version's closed cases with the shop's strength weights (option key → cause slug → p),
 * and how many closed cases it was learned from. Re-learned in the transaction of every change to
 * its inputs (a case on the version closed or reopened, the shop's diagnosis settings saved).
 */
export const learnedLikelihoods = pgTable("learned_likelihoods", {
  versionId: integer("version_id").primaryKey().references(() => treeVersions.id, { onDelete: "cascade" }),
  cases: integer("cases").notNull(),
  likelihoods: jsonb("likelihoods").$type<Record<string, Record<string, number>>>().notNull(),
  learnedAt: ts("learned_at").notNull().defaultNow(),
});
export type LearnedLikelihoodsRow = typeof learnedLikelihoods.$inferSelect;

export const treeCauses = pgTable(
  "tree_causes",
  {
    versionId: integer("version_id").notNull().references(() => treeVersions.id, { onDelete: "cascade" }),
    causeId: integer("cause_id").notNull().references(() => causes.id),
    priorWeight: real("prior_weight").notNull().default(1),
  },
  (t) => [primaryKey({ columns: [t.versionId, t.causeId] }), check("tree_causes_weight_check", sql`${t.priorWeight} >= 0`)],
);

export const NODE_KINDS = ["question", "check", "cause", "caution"] as const;
export type NodeKind = (typeof NODE_KINDS)[number];

export const treeNodes = pgTable(
  "tree_nodes",
  {
    id: serial("id").primaryKey(),
    versionId: integer("version_id").notNull().references(() => treeVersions.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    kind: text("kind").$type<NodeKind>().notNull(),
    title: text("title").notNull().default(""),
    prompt: text("prompt").notNull().default(""),
    costMinutes: integer("cost_minutes").notNull().default(1),
    needsOpening: boolean("needs_opening").notNull().default(false),
    causeId: integer("cause_id").references(() => causes.id),
    cautionText: text("caution_text").notNull().default(""),
    posX: real("pos_x").notNull().default(0),
    posY: real("pos_y").notNull().default(0),
  },
  (t) => [
    uniqueIndex("tree_nodes_key").on(t.versionId, t.key),
    check("tree_nodes_kind_check", sql`${t.kind} in (${inList(NODE_KINDS)})`),
    check("tree_nodes_cost_check", sql`${t.costMinutes} > 0`),
  ],
);
export type TreeNode = typeof treeNodes.$inferSelect;

/** An edge of the tree: one answer option of a question or check, leading to the next node. */
export const treeOptions = pgTable(
  "tree_options",
  {
    id: serial("id").primaryKey(),
    versionId: integer("version_id").notNull().references(() => treeVersions.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    fromNodeId: integer("from_node_id").notNull().references(() => treeNodes.id, { onDelete: "cascade" }),
    toNodeId: integer("to_node_id").references(() => treeNodes.id, { onDelete: "set null" }),
    label: text("label").notNull(),
    dontKnow: boolean("dont_know").notNull().default(false),
    sortOrder: integer("sort_order").notNull().default(0),
  },
  (t) => [uniqueIndex("tree_options_key").on(t.versionId, t.key), index("tree_options_from_idx").on(t.fromNodeId), index("tree_options_to_idx").on(t.toNodeId)],
);
export type TreeOption = typeof treeOptions.$inferSelect;

export type StrengthName = Strength;

export const optionEvidence = pgTable(
  "option_evidence",
  {
    optionId: integer("option_id").notNull().references(() => treeOptions.id, { onDelete: "cascade" }),
    causeId: integer("cause_id").notNull().references(() => causes.id),
    strength: text("strength").$type<StrengthName>().notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.optionId, t.causeId] }),
    check("option_evidence_strength_check", sql`${t.strength} in (${inList(STRENGTHS)})`),
  ],
);

/* ---------- cases ---------- */

export const CASE_STATUSES = ["open", "advised", "booked_in", "on_bench", "closed"] as const;
export type CaseStatus = (typeof CASE_STATUSES)[number];
export const CALLER_KINDS = ["rider", "dealer"] as const;
export const RIDING_USES = ["road", "trail", "cargo", "commuting"] as const;

export const cases = pgTable(
  "cases",
  {
    id: serial("id").primaryKey(),
    reference: text("reference").notNull(),
    status: text("status").$type<CaseStatus>().notNull().default("open"),
    callerName: text("caller_name").notNull(),
    callerKind: text("caller_kind").$type<(typeof CALLER_KINDS)[number]>().notNull(),
    phone: text("phone").notNull().default(""),
    email: text("email").notNull().default(""),
    familyId: integer("family_id").notNull().references(() => motorFamilies.id),
    serial: text("serial").notNull().default(""),
    ridingUse: text("riding_use").$type<(typeof RIDING_USES)[number]>().notNull(),
    symptom: text("symptom").notNull(),
    treeVersionId: integer("tree_version_id").notNull().references(() => treeVersions.id),
    technicianId: text("technician_id").references(() => users.id),
    notes: text("notes").notNull().default(""),
    /** The ranking at the end of triage, kept for tree-accuracy reports: { [causeSlug | "unlisted"]: p }. */
    finalRanking: jsonb("final_ranking").$type<Record<string, number>>(),
    quoteLowCents: integer("quote_low_cents"),
    quoteHighCents: integer("quote_high_cents"),
    benchPlan: jsonb("bench_plan").$type<{ order: string[]; expectedMinutes: number }>(),
    whatToSend: text("what_to_send").notNull().default(""),
    repeatOfCaseId: integer("repeat_of_case_id"),
    /**
     * Copies of this case's own bench outcome, written with it by `storeOutcomeCopies`: the primary
     * confirmed cause and every confirmed cause (outcome_causes) and the upgrades fitted
     * (outcome_upgrades), so return-free follow-up reads the repairs from one index; the parts
     * replaced (outcome_parts, ids and quantities in the same order), so parts demand sums them from
     * the case rows without a join. No foreign keys: the outcome tables hold those.
     */
    primaryCauseId: integer("primary_cause_id"),
    confirmedCauseIds: integer("confirmed_cause_ids").array().notNull().default(sql`'{}'::integer[]`),
    fittedUpgrades: text("fitted_upgrades").array().$type<UpgradeKind[]>().notNull().default(sql`'{}'::text[]`),
    partIds: integer("part_ids").array().notNull().default(sql`'{}'::integer[]`),
    partQuantities: integer("part_quantities").array().notNull().default(sql`'{}'::integer[]`),
    /**
     * Copies of the unit's next visit: the next case of the same motor family and serial by
     * (created_at, id), its opening time and its confirmed causes, so follow-up reads each repair
     * with its next visit from its own row. Null when there is none (always without a serial).
     * Kept by a trigger on cases for every writer (db/migrations/0016_case_next_visit.sql).
     */
    nextVisitAt: ts("next_visit_at"),
    nextVisitCauseIds: integer("next_visit_cause_ids").array(),
    createdAt: createdAt(),
    updatedAt: ts("updated_at").notNull().defaultNow(),
    triagedAt: ts("triaged_at"),
    closedAt: ts("closed_at"),
  },
  (t) => [
    uniqueIndex("cases_reference_key").on(t.reference),
    index("cases_status_created_idx").on(t.status, t.createdAt),
    index("cases_family_closed_idx").on(t.familyId, t.closedAt),
    // A family's confirmed history, which every triage answer reads (lib/triage/history.ts).
    index("cases_family_history_idx").on(t.familyId, t.confirmedCauseIds).where(sql`${t.status} = 'closed'`),
    index("cases_technician_idx").on(t.technicianId),
    index("cases_serial_idx").on(t.serial),
    index("cases_version_idx").on(t.treeVersionId),
    // A unit's visits in order: where the next-visit trigger finds a visit's predecessor and its unit's visits.
    index("cases_visits_idx").on(t.familyId, t.serial, t.createdAt, t.id).where(sql`${t.serial} <> ''`),
    // The repairs follow-up reads (of one family, or all), with all it reads of them, so it never visits the table's pages.
    index("cases_follow_up_idx")
      .on(t.familyId, t.closedAt, t.ridingUse, t.primaryCauseId, t.fittedUpgrades, t.nextVisitAt, t.nextVisitCauseIds)
      .where(sql`${t.status} = 'closed' and ${t.serial} <> ''`),
    check("cases_status_check", sql`${t.status} in (${inList(CASE_STATUSES)})`),
    check("cases_caller_kind_check", sql`${t.callerKind} in (${inList(CALLER_KINDS)})`),
    check("cases_riding_use_check", sql`${t.ridingUse} in (${inList(RIDING_USES)})`),
  ],
);
export type Case = typeof cases.$inferSelect;

export const caseSteps = pgTable(
  "case_steps",
  {
    id: serial("id").primaryKey(),
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    seq: integer("seq").notNull(),
    nodeId: integer("node_id").notNull().references(() => treeNodes.id),
    optionId: integer("option_id").notNull().references(() => treeOptions.id),
    answeredBy: text("answered_by").references(() => users.id),
    answeredAt: ts("answered_at").notNull().defaultNow(),
    /** What the screen showed after this answer: causes, unlisted share, suggestions, conclusion. */
    ranking: jsonb("ranking").notNull(),
  },
  // The node and option indexes let a draft's nodes and options be deleted without scanning every step.
  (t) => [uniqueIndex("case_steps_seq_key").on(t.caseId, t.seq), index("case_steps_node_idx").on(t.nodeId), index("case_steps_option_idx").on(t.optionId)],
);
export type CaseStep = typeof caseSteps.$inferSelect;

export const caseEvents = pgTable(
  "case_events",
  {
    id: serial("id").primaryKey(),
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    kind: text("kind").notNull(),
    fromStatus: text("from_status"),
    toStatus: text("to_status"),
    byUserId: text("by_user_id").references(() => users.id),
    note: text("note").notNull().default(""),
    at: ts("at").notNull().defaultNow(),
  },
  (t) => [index("case_events_case_idx").on(t.caseId)],
);

export const caseOutcomes = pgTable("case_outcomes", {
  caseId: integer("case_id").primaryKey().references(() => cases.id, { onDelete: "cascade" }),
  otherCause: text("other_cause").notNull().default(""),
  upgrades: text("upgrades").notNull().default(""),
  labourMinutes: integer("labour_minutes").notNull().default(0),
  /**
   * Expected teardown minutes of the bench plan the case's final ranking gave, in its family's
   * stages as they stood when the outcome was saved; null without a final ranking (an imported
   * record). Written with the outcome (storePlannedTeardown), read by "plan against recorded labour".
   */
  plannedTeardownMinutes: doublePrecision("planned_teardown_minutes"),
  notes: text("notes").notNull().default(""),
  recordedBy: text("recorded_by").references(() => users.id),
  recordedAt: ts("recorded_at").notNull().defaultNow(),
});

export const outcomeCauses = pgTable(
  "outcome_causes",
  {
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    causeId: integer("cause_id").notNull().references(() => causes.id),
    primary: boolean("is_primary").notNull().default(true),
  },
  (t) => [
    primaryKey({ columns: [t.caseId, t.causeId] }),
    index("outcome_causes_cause_idx").on(t.causeId),
    // At most one primary confirmed cause per case; reports join on it, so it is also their index.
    uniqueIndex("outcome_causes_one_primary_key").on(t.caseId).where(sql`${t.primary}`),
  ],
);

export const outcomeParts = pgTable(
  "outcome_parts",
  {
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    partId: integer("part_id").notNull().references(() => parts.id),
    quantity: integer("quantity").notNull().default(1),
  },
  (t) => [
    primaryKey({ columns: [t.caseId, t.partId] }),
    index("outcome_parts_part_idx").on(t.partId),
    check("outcome_parts_qty_check", sql`${t.quantity} > 0`),
  ],
);

/** Upgrades the shop fits beyond the repair; names and the cause group each guards are in lib/survival/upgrades.ts. */
export const UPGRADE_KINDS = ["uprated-clutch", "crank-seal-barrier", "sealed-bearings", "sealed-screws", "conformal-coating", "cable-sleeve"] as const;
export type UpgradeKind = (typeof UPGRADE_KINDS)[number];

export const outcomeUpgrades = pgTable(
  "outcome_upgrades",
  {
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    upgrade: text("upgrade").$type<UpgradeKind>().notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.caseId, t.upgrade] }),
    check("outcome_upgrades_upgrade_check", sql`${t.upgrade} in (${inList(UPGRADE_KINDS)})`),
  ],
);

/**
 * How the ranking at the end of triage scored against the bench outcome's primary cause, one row per
 * case with both (rankingRowScore): written with the outcome in its transaction, so tree-accuracy
 * reports add these up in SQL instead of decoding every stored ranking.
 */
export const triageScores = pgTable("triage_scores", {
  caseId: integer("case_id").primaryKey().references(() => cases.id, { onDelete: "cascade" }),
  /** 1-based rank of the confirmed cause in the final ranking; null when it was not predicted at all. */
  confirmedRank: integer("confirmed_rank"),
  confirmedP: doublePrecision("confirmed_p").notNull(),
  topP: doublePrecision("top_p").notNull(),
  brier: doublePrecision("brier").notNull(),
  logLoss: doublePrecision("log_loss").notNull(),
});

/* ---------- knowledge ---------- */

export const WRITEUP_STATUSES = ["draft", "published"] as const;
export const writeups = pgTable(
  "writeups",
  {
    id: serial("id").primaryKey(),
    slug: text("slug").notNull(),
    title: text("title").notNull(),
    summary: text("summary").notNull().default(""),
    body: text("body").notNull().default(""),
    status: text("status").$type<(typeof WRITEUP_STATUSES)[number]>().notNull().default("draft"),
    authorId: text("author_id").references(() => users.id),
    caseId: integer("case_id").references(() => cases.id, { onDelete: "set null" }),
    tags: text("tags").array().notNull().default(sql`'{}'::text[]`),
    createdAt: createdAt(),
    updatedAt: ts("updated_at").notNull().defaultNow(),
    publishedAt: ts("published_at"),
    publishedBy: text("published_by").references(() => users.id),
  },
  (t) => [
    uniqueIndex("writeups_slug_key").on(t.slug),
    index("writeups_status_idx").on(t.status, t.publishedAt),
    check("writeups_status_check", sql`${t.status} in (${inList(WRITEUP_STATUSES)})`),
  ],
);
export type Writeup = typeof writeups.$inferSelect;

export const writeupFamilies = pgTable(
  "writeup_families",
  {
    writeupId: integer("writeup_id").notNull().references(() => writeups.id, { onDelete: "cascade" }),
    familyId: integer("family_id").notNull().references(() => motorFamilies.id),
  },
  (t) => [primaryKey({ columns: [t.writeupId, t.familyId] })],
);
export const writeupCauses = pgTable(
  "writeup_causes",
  {
    writeupId: integer("writeup_id").notNull().references(() => writeups.id, { onDelete: "cascade" }),
    causeId: integer("cause_id").notNull().references(() => causes.id),
  },
  (t) => [primaryKey({ columns: [t.writeupId, t.causeId] }), index("writeup_causes_cause_idx").on(t.causeId)],
);
export const writeupParts = pgTable(
  "writeup_parts",
  {
    writeupId: integer("writeup_id").notNull().references(() => writeups.id, { onDelete: "cascade" }),
    partId: integer("part_id").notNull().references(() => parts.id),
  },
  (t) => [primaryKey({ columns: [t.writeupId, t.partId] })],
);

export const practiceAttempts = pgTable(
  "practice_attempts",
  {
    id: serial("id").primaryKey(),
    traineeId: text("trainee_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    revealedSteps: integer("revealed_steps").notNull().default(0),
    committedCauseId: integer("committed_cause_id").references(() => causes.id),
    hit: boolean("hit"),
    startedAt: ts("started_at").notNull().defaultNow(),
    finishedAt: ts("finished_at"),
  },
  (t) => [index("practice_attempts_trainee_idx").on(t.traineeId)],
);

/* ---------- files and mail ---------- */

export const uploads = pgTable(
  "uploads",
  {
    id: text("id").primaryKey(),
    storageKey: text("storage_key").notNull(),
    originalName: text("original_name").notNull(),
    mime: text("mime").notNull(),
    bytes: integer("bytes").notNull(),
    width: integer("width"),
    height: integer("height"),
    uploadedBy: text("uploaded_by").references(() => users.id),
    caseId: integer("case_id").references(() => cases.id, { onDelete: "set null" }),
    writeupId: integer("writeup_id").references(() => writeups.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("uploads_case_idx").on(t.caseId), index("uploads_writeup_idx").on(t.writeupId)],
);
export type Upload = typeof uploads.$inferSelect;

export const MAIL_STATUSES = ["queued", "sent", "failed"] as const;
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: serial("id").primaryKey(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    textBody: text("text_body").notNull(),
    htmlBody: text("html_body"),
    caseId: integer("case_id").references(() => cases.id, { onDelete: "set null" }),
    status: text("status").$type<(typeof MAIL_STATUSES)[number]>().notNull().default("queued"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: ts("next_attempt_at").notNull().defaultNow(),
    lastError: text("last_error"),
    createdAt: createdAt(),
    sentAt: ts("sent_at"),
    // A worker's claim: held until claimed_until on the database clock, released when it records the outcome.
    claimToken: text("claim_token"),
    claimedUntil: ts("claimed_until"),
    // Fixed before the first send, so a resend after an unknown outcome carries the same Message-ID.
    messageId: text("message_id"),
  },
  (t) => [
    index("mail_outbox_due_idx").on(t.status, t.nextAttemptAt),
    check("mail_outbox_status_check", sql`${t.status} in (${inList(MAIL_STATUSES)})`),
  ],
);
export type OutboxMessage = typeof mailOutbox.$inferSelect;

/* ---------- relations ---------- */

export const usersRelations = relations(users, ({ many }) => ({ sessions: many(sessions) }));
export const sessionsRelations = relations(sessions, ({ one }) => ({
  user: one(users, { fields: [sessions.userId], references: [users.id] }),
}));
export const makersRelations = relations(motorMakers, ({ many }) => ({ families: many(motorFamilies) }));
export const familiesRelations = relations(motorFamilies, ({ one }) => ({
  maker: one(motorMakers, { fields: [motorFamilies.makerId], references: [motorMakers.id] }),
}));
export const causesRelations = relations(causes, ({ many }) => ({ parts: many(causeParts) }));
export const causePartsRelations = relations(causeParts, ({ one }) => ({
  cause: one(causes, { fields: [causeParts.causeId], references: [causes.id] }),
  part: one(parts, { fields: [causeParts.partId], references: [parts.id] }),
}));
export const treesRelations = relations(trees, ({ many }) => ({ versions: many(treeVersions), scope: many(treeScope) }));
export const treeScopeRelations = relations(treeScope, ({ one }) => ({
  tree: one(trees, { fields: [treeScope.treeId], references: [trees.id] }),
  family: one(motorFamilies, { fields: [treeScope.familyId], references: [motorFamilies.id] }),
}));
export const treeVersionsRelations = relations(treeVersions, ({ one, many }) => ({
  tree: one(trees, { fields: [treeVersions.treeId], references: [trees.id] }),
  nodes: many(treeNodes),
  options: many(treeOptions),
  causes: many(treeCauses),
}));
export const treeCausesRelations = relations(treeCauses, ({ one }) => ({
  version: one(treeVersions, { fields: [treeCauses.versionId], references: [treeVersions.id] }),
  cause: one(causes, { fields: [treeCauses.causeId], references: [causes.id] }),
}));
export const treeNodesRelations = relations(treeNodes, ({ one }) => ({
  version: one(treeVersions, { fields: [treeNodes.versionId], references: [treeVersions.id] }),
  cause: one(causes, { fields: [treeNodes.causeId], references: [causes.id] }),
}));
export const treeOptionsRelations = relations(treeOptions, ({ one, many }) => ({
  version: one(treeVersions, { fields: [treeOptions.versionId], references: [treeVersions.id] }),
  evidence: many(optionEvidence),
}));
export const optionEvidenceRelations = relations(optionEvidence, ({ one }) => ({
  option: one(treeOptions, { fields: [optionEvidence.optionId], references: [treeOptions.id] }),
  cause: one(causes, { fields: [optionEvidence.causeId], references: [causes.id] }),
}));
export const casesRelations = relations(cases, ({ one, many }) => ({
  family: one(motorFamilies, { fields: [cases.familyId], references: [motorFamilies.id] }),
  version: one(treeVersions, { fields: [cases.treeVersionId], references: [treeVersions.id] }),
  technician: one(users, { fields: [cases.technicianId], references: [users.id] }),
  steps: many(caseSteps),
  outcome: one(caseOutcomes, { fields: [cases.id], references: [caseOutcomes.caseId] }),
  confirmedCauses: many(outcomeCauses),
  partsReplaced: many(outcomeParts),
  events: many(caseEvents),
}));
export const caseStepsRelations = relations(caseSteps, ({ one }) => ({
  case: one(cases, { fields: [caseSteps.caseId], references: [cases.id] }),
  node: one(treeNodes, { fields: [caseSteps.nodeId], references: [treeNodes.id] }),
  option: one(treeOptions, { fields: [caseSteps.optionId], references: [treeOptions.id] }),
}));
export const caseEventsRelations = relations(caseEvents, ({ one }) => ({
  case: one(cases, { fields: [caseEvents.caseId], references: [cases.id] }),
}));
export const outcomeCausesRelations = relations(outcomeCauses, ({ one }) => ({
  case: one(cases, { fields: [outcomeCauses.caseId], references: [cases.id] }),
  cause: one(causes, { fields: [outcomeCauses.causeId], references: [causes.id] }),
}));
export const outcomePartsRelations = relations(outcomeParts, ({ one }) => ({
  case: one(cases, { fields: [outcomeParts.caseId], references: [cases.id] }),
  part: one(parts, { fields: [outcomeParts.partId], references: [parts.id] }),
}));
export const writeupsRelations = relations(writeups, ({ one, many }) => ({
  author: one(users, { fields: [writeups.authorId], references: [users.id] }),
  families: many(writeupFamilies),
  causes: many(writeupCauses),
  parts: many(writeupParts),
}));
export const writeupFamiliesRelations = relations(writeupFamilies, ({ one }) => ({
  writeup: one(writeups, { fields: [writeupFamilies.writeupId], references: [writeups.id] }),
  family: one(motorFamilies, { fields: [writeupFamilies.familyId], references: [motorFamilies.id] }),
}));
export const writeupCausesRelations = relations(writeupCauses, ({ one }) => ({
  writeup: one(writeups, { fields: [writeupCauses.writeupId], references: [writeups.id] }),
  cause: one(causes, { fields: [writeupCauses.causeId], references: [causes.id] }),
}));
export const writeupPartsRelations = relations(writeupParts, ({ one }) => ({
  writeup: one(writeups, { fields: [writeupParts.writeupId], references: [writeups.id] }),
  part: one(parts, { fields: [writeupParts.partId], references: [parts.id] }),
}));

/* ---------- bench teardown: assemblies of a motor family, where each cause is inspected, findings ---------- */

/** The standing caution a stage needs: battery out and power off, or the press. */
export const ASSEMBLY_CAUTIONS = ["none", "power", "press"] as const;
export type AssemblyCaution = (typeof ASSEMBLY_CAUTIONS)[number];

export const assemblies = pgTable(
  "assemblies",
  {
    id: serial("id").primaryKey(),
    familyId: integer("family_id").notNull().references(() => motorFamilies.id, { onDelete: "cascade" }),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    /** Null for the unit as it arrives, the one root of the family's tree of assemblies. */
    parentId: integer("parent_id").references((): AnyPgColumn => assemblies.id),
    openMinutes: integer("open_minutes").notNull().default(0),
    closeMinutes: integer("close_minutes").notNull().default(0),
    caution: text("caution").$type<AssemblyCaution>().notNull().default("none"),
    position: integer("position").notNull().default(0),
  },
  (t) => [
    uniqueIndex("assemblies_family_slug_key").on(t.familyId, t.slug),
    index("assemblies_parent_idx").on(t.parentId),
    check("assemblies_minutes_check", sql`${t.openMinutes} >= 0 and ${t.closeMinutes} >= 0`),
    check("assemblies_caution_check", sql`${t.caution} in (${inList(ASSEMBLY_CAUTIONS)})`),
  ],
);
export type AssemblyRow = typeof assemblies.$inferSelect;

/** Where a cause is inspected in a family's unit, and how long the inspection takes once that assembly is open. */
export const causeLocations = pgTable(
  "cause_locations",
  {
    familyId: integer("family_id").notNull().references(() => motorFamilies.id, { onDelete: "cascade" }),
    causeId: integer("cause_id").notNull().references(() => causes.id, { onDelete: "cascade" }),
    assemblyId: integer("assembly_id").notNull().references(() => assemblies.id, { onDelete: "cascade" }),
    inspectMinutes: integer("inspect_minutes").notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.familyId, t.causeId] }),
    index("cause_locations_cause_idx").on(t.causeId),
    index("cause_locations_assembly_idx").on(t.assemblyId),
    check("cause_locations_minutes_check", sql`${t.inspectMinutes} >= 0`),
  ],
);

export const FINDING_RESULTS = ["found", "not_found", "not_done"] as const;
export type FindingResult = (typeof FINDING_RESULTS)[number];

/** One inspection at the bench: the latest result recorded for a cause on a case. */
export const benchFindings = pgTable(
  "bench_findings",
  {
    caseId: integer("case_id").notNull().references(() => cases.id, { onDelete: "cascade" }),
    causeId: integer("cause_id").notNull().references(() => causes.id),
    result: text("result").$type<FindingResult>().notNull(),
    photoId: text("photo_id").references(() => uploads.id, { onDelete: "set null" }),
    note: text("note").notNull().default(""),
    recordedBy: text("recorded_by").references(() => users.id),
    recordedAt: ts("recorded_at").notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ columns: [t.caseId, t.causeId] }),
    index("bench_findings_cause_idx").on(t.causeId),
    index("bench_findings_photo_idx").on(t.photoId),
    check("bench_findings_result_check", sql`${t.result} in (${inList(FINDING_RESULTS)})`),
  ],
);
export type BenchFinding = typeof benchFindings.$inferSelect;

/* ---------- secrets shared by every app process ---------- */

/**
 * Keys the app makes for itself when the environment gives none (e.g. the CSV import signing
 * key): made once by whichever process needs it first, then the same for every process.
 */
export const appSecrets = pgTable("app_secrets", {
  name: text("name").primaryKey(),
  value: text("value").notNull(),
  createdAt: createdAt(),
});
