CREATE TABLE "outcome_upgrades" (
	"case_id" integer NOT NULL,
	"upgrade" text NOT NULL,
	CONSTRAINT "outcome_upgrades_case_id_upgrade_pk" PRIMARY KEY("case_id","upgrade"),
	CONSTRAINT "outcome_upgrades_upgrade_check" CHECK ("outcome_upgrades"."upgrade" in ('uprated-clutch', 'crank-seal-barrier', 'sealed-bearings', 'sealed-screws', 'conformal-coating', 'cable-sleeve'))
);
--> statement-breakpoint
ALTER TABLE "outcome_upgrades" ADD CONSTRAINT "outcome_upgrades_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "cases_visits_idx" ON "cases" USING btree ("family_id","serial","created_at","id","status","closed_at","riding_use") WHERE "cases"."serial" <> '';