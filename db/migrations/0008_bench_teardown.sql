CREATE TABLE "assemblies" (
	"id" serial PRIMARY KEY NOT NULL,
	"family_id" integer NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"parent_id" integer,
	"open_minutes" integer DEFAULT 0 NOT NULL,
	"close_minutes" integer DEFAULT 0 NOT NULL,
	"caution" text DEFAULT 'none' NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "assemblies_minutes_check" CHECK ("assemblies"."open_minutes" >= 0 and "assemblies"."close_minutes" >= 0),
	CONSTRAINT "assemblies_caution_check" CHECK ("assemblies"."caution" in ('none', 'power', 'press'))
);
--> statement-breakpoint
CREATE TABLE "bench_findings" (
	"case_id" integer NOT NULL,
	"cause_id" integer NOT NULL,
	"result" text NOT NULL,
	"photo_id" text,
	"note" text DEFAULT '' NOT NULL,
	"recorded_by" text,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "bench_findings_case_id_cause_id_pk" PRIMARY KEY("case_id","cause_id"),
	CONSTRAINT "bench_findings_result_check" CHECK ("bench_findings"."result" in ('found', 'not_found', 'not_done'))
);
--> statement-breakpoint
CREATE TABLE "cause_locations" (
	"family_id" integer NOT NULL,
	"cause_id" integer NOT NULL,
	"assembly_id" integer NOT NULL,
	"inspect_minutes" integer NOT NULL,
	CONSTRAINT "cause_locations_family_id_cause_id_pk" PRIMARY KEY("family_id","cause_id"),
	CONSTRAINT "cause_locations_minutes_check" CHECK ("cause_locations"."inspect_minutes" >= 0)
);
--> statement-breakpoint
ALTER TABLE "assemblies" ADD CONSTRAINT "assemblies_family_id_motor_families_id_fk" FOREIGN KEY ("family_id") REFERENCES "public"."motor_families"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assemblies" ADD CONSTRAINT "assemblies_parent_id_assemblies_id_fk" FOREIGN KEY ("parent_id") REFERENCES "public"."assemblies"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_findings" ADD CONSTRAINT "bench_findings_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_findings" ADD CONSTRAINT "bench_findings_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_findings" ADD CONSTRAINT "bench_findings_photo_id_uploads_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_findings" ADD CONSTRAINT "bench_findings_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cause_locations" ADD CONSTRAINT "cause_locations_family_id_motor_families_id_fk" FOREIGN KEY ("family_id") REFERENCES "public"."motor_families"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cause_locations" ADD CONSTRAINT "cause_locations_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cause_locations" ADD CONSTRAINT "cause_locations_assembly_id_assemblies_id_fk" FOREIGN KEY ("assembly_id") REFERENCES "public"."assemblies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "assemblies_family_slug_key" ON "assemblies" USING btree ("family_id","slug");--> statement-breakpoint
CREATE INDEX "assemblies_parent_idx" ON "assemblies" USING btree ("parent_id");--> statement-breakpoint
CREATE INDEX "bench_findings_cause_idx" ON "bench_findings" USING btree ("cause_id");--> statement-breakpoint
CREATE INDEX "bench_findings_photo_idx" ON "bench_findings" USING btree ("photo_id");--> statement-breakpoint
CREATE INDEX "cause_locations_cause_idx" ON "cause_locations" USING btree ("cause_id");--> statement-breakpoint
CREATE INDEX "cause_locations_assembly_idx" ON "cause_locations" USING btree ("assembly_id");