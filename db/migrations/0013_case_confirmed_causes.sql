DROP INDEX "cases_visits_idx";--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "primary_cause_id" integer;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "confirmed_cause_ids" integer[] DEFAULT '{}'::integer[] NOT NULL;--> statement-breakpoint
-- Backfill: each case's copy of its own confirmed causes, as storeConfirmedCauses writes it.
UPDATE "cases" c SET
  "primary_cause_id" = (SELECT oc."cause_id" FROM "outcome_causes" oc WHERE oc."case_id" = c."id" AND oc."is_primary"),
  "confirmed_cause_ids" = (SELECT array_agg(oc."cause_id" ORDER BY oc."cause_id") FROM "outcome_causes" oc WHERE oc."case_id" = c."id")
WHERE EXISTS (SELECT 1 FROM "outcome_causes" oc WHERE oc."case_id" = c."id");--> statement-breakpoint
CREATE INDEX "cases_visits_idx" ON "cases" USING btree ("family_id","serial","created_at","id","status","closed_at","riding_use","primary_cause_id","confirmed_cause_ids") WHERE "cases"."serial" <> '';