CREATE TABLE "triage_scores" (
	"case_id" integer PRIMARY KEY NOT NULL,
	"confirmed_rank" integer,
	"confirmed_p" double precision NOT NULL,
	"top_p" double precision NOT NULL,
	"brier" double precision NOT NULL,
	"log_loss" double precision NOT NULL
);
--> statement-breakpoint
ALTER TABLE "triage_scores" ADD CONSTRAINT "triage_scores_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
-- Backfill: the cases closed (or with an outcome) before scores were stored, scored exactly as
-- rankingRowScore does (truth = the primary cause when the ranking lists it, else "unlisted";
-- ties count against the confirmed cause; log loss clipped to [1e-6, 1]; Brier summed over the
-- categories, the confirmed one at p = 0 when absent). Cases written later are scored by the app.
INSERT INTO "triage_scores" ("case_id", "confirmed_rank", "confirmed_p", "top_p", "brier", "log_loss")
SELECT c.id,
  CASE WHEN t.pc = 0 THEN NULL
       ELSE 1 + (SELECT count(*) FROM jsonb_each_text(c.final_ranking) e WHERE e.key <> t.truth AND e.value::float8 >= t.pc)::int END,
  t.pc,
  coalesce((SELECT max(e.value::float8) FROM jsonb_each_text(c.final_ranking) e), 0),
  (CASE WHEN c.final_ranking ? t.truth THEN 0 ELSE 1 END)
    + coalesce((SELECT sum(CASE WHEN e.key = t.truth THEN (e.value::float8 - 1) ^ 2 ELSE e.value::float8 ^ 2 END) FROM jsonb_each_text(c.final_ranking) e), 0),
  -ln(least(1, greatest(1e-6, t.pc)))
FROM "cases" c
LEFT JOIN "outcome_causes" oc ON oc.case_id = c.id AND oc.is_primary
LEFT JOIN "causes" ca ON ca.id = oc.cause_id
CROSS JOIN LATERAL (
  SELECT x.truth, coalesce((c.final_ranking ->> x.truth)::float8, 0) AS pc
  FROM (SELECT CASE WHEN ca.slug IS NOT NULL AND ca.slug <> 'unlisted' AND c.final_ranking ? ca.slug THEN ca.slug ELSE 'unlisted' END AS truth) x
) t
WHERE c.final_ranking IS NOT NULL
  AND (c.status = 'closed' OR EXISTS (SELECT 1 FROM "case_outcomes" o WHERE o.case_id = c.id));
