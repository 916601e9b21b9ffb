DROP INDEX "cases_visits_idx";--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "fitted_upgrades" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "part_ids" integer[] DEFAULT '{}'::integer[] NOT NULL;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "part_quantities" integer[] DEFAULT '{}'::integer[] NOT NULL;--> statement-breakpoint
-- Backfill: each case's copy of its own upgrades fitted and parts replaced, as storeOutcomeCopies writes it.
UPDATE "cases" c SET "fitted_upgrades" = u."upgrades"
FROM (SELECT "case_id", array_agg("upgrade" ORDER BY "upgrade") AS "upgrades" FROM "outcome_upgrades" GROUP BY "case_id") u
WHERE u."case_id" = c."id";--> statement-breakpoint
UPDATE "cases" c SET "part_ids" = p."ids", "part_quantities" = p."quantities"
FROM (SELECT "case_id", array_agg("part_id" ORDER BY "part_id") AS "ids", array_agg("quantity" ORDER BY "part_id") AS "quantities"
      FROM "outcome_parts" GROUP BY "case_id") p
WHERE p."case_id" = c."id";--> statement-breakpoint
CREATE INDEX "cases_visits_idx" ON "cases" USING btree ("family_id","serial","created_at","id","status","closed_at","riding_use","primary_cause_id","confirmed_cause_ids","fitted_upgrades") WHERE "cases"."serial" <> '';