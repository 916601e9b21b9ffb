CREATE TABLE "case_events" (
	"id" serial PRIMARY KEY NOT NULL,
	"case_id" integer NOT NULL,
	"kind" text NOT NULL,
	"from_status" text,
	"to_status" text,
	"by_user_id" text,
	"note" text DEFAULT '' NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "case_outcomes" (
	"case_id" integer PRIMARY KEY NOT NULL,
	"other_cause" text DEFAULT '' NOT NULL,
	"upgrades" text DEFAULT '' NOT NULL,
	"labour_minutes" integer DEFAULT 0 NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"recorded_by" text,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "case_steps" (
	"id" serial PRIMARY KEY NOT NULL,
	"case_id" integer NOT NULL,
	"seq" integer NOT NULL,
	"node_id" integer NOT NULL,
	"option_id" integer NOT NULL,
	"answered_by" text,
	"answered_at" timestamp with time zone DEFAULT now() NOT NULL,
	"ranking" jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "cases" (
	"id" serial PRIMARY KEY NOT NULL,
	"reference" text NOT NULL,
	"status" text DEFAULT 'open' NOT NULL,
	"caller_name" text NOT NULL,
	"caller_kind" text NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"family_id" integer NOT NULL,
	"serial" text DEFAULT '' NOT NULL,
	"riding_use" text NOT NULL,
	"symptom" text NOT NULL,
	"tree_version_id" integer NOT NULL,
	"technician_id" text,
	"notes" text DEFAULT '' NOT NULL,
	"final_ranking" jsonb,
	"quote_low_cents" integer,
	"quote_high_cents" integer,
	"bench_plan" jsonb,
	"what_to_send" text DEFAULT '' NOT NULL,
	"repeat_of_case_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"triaged_at" timestamp with time zone,
	"closed_at" timestamp with time zone,
	CONSTRAINT "cases_status_check" CHECK ("cases"."status" in ('open', 'advised', 'booked_in', 'on_bench', 'closed')),
	CONSTRAINT "cases_caller_kind_check" CHECK ("cases"."caller_kind" in ('rider', 'dealer')),
	CONSTRAINT "cases_riding_use_check" CHECK ("cases"."riding_use" in ('road', 'trail', 'cargo', 'commuting'))
);
--> statement-breakpoint
CREATE TABLE "cause_parts" (
	"cause_id" integer NOT NULL,
	"part_id" integer NOT NULL,
	"quantity" integer DEFAULT 1 NOT NULL,
	CONSTRAINT "cause_parts_cause_id_part_id_pk" PRIMARY KEY("cause_id","part_id"),
	CONSTRAINT "cause_parts_qty_check" CHECK ("cause_parts"."quantity" > 0)
);
--> statement-breakpoint
CREATE TABLE "causes" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"area" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"inspect_minutes" integer DEFAULT 15 NOT NULL,
	"labour_minutes" integer DEFAULT 60 NOT NULL,
	"price_low_cents" integer DEFAULT 0 NOT NULL,
	"price_high_cents" integer DEFAULT 0 NOT NULL,
	"rating_nm" integer,
	"active" boolean DEFAULT true NOT NULL,
	CONSTRAINT "causes_area_check" CHECK ("causes"."area" in ('clutch', 'bearing', 'seal', 'drive_train', 'sensor', 'electronics', 'cable', 'firmware', 'housing', 'other')),
	CONSTRAINT "causes_minutes_check" CHECK ("causes"."inspect_minutes" > 0 and "causes"."labour_minutes" >= 0),
	CONSTRAINT "causes_price_check" CHECK ("causes"."price_low_cents" >= 0 and "causes"."price_high_cents" >= "causes"."price_low_cents")
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" serial PRIMARY KEY NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"text_body" text NOT NULL,
	"html_body" text,
	"case_id" integer,
	"status" text DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	CONSTRAINT "mail_outbox_status_check" CHECK ("mail_outbox"."status" in ('queued', 'sent', 'failed'))
);
--> statement-breakpoint
CREATE TABLE "motor_families" (
	"id" serial PRIMARY KEY NOT NULL,
	"maker_id" integer NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"generation" text DEFAULT '' NOT NULL,
	"years" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "motor_makers" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"blurb" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "option_evidence" (
	"option_id" integer NOT NULL,
	"cause_id" integer NOT NULL,
	"strength" text NOT NULL,
	CONSTRAINT "option_evidence_option_id_cause_id_pk" PRIMARY KEY("option_id","cause_id"),
	CONSTRAINT "option_evidence_strength_check" CHECK ("option_evidence"."strength" in ('rules_out', 'against', 'neutral', 'for', 'strong'))
);
--> statement-breakpoint
CREATE TABLE "outcome_causes" (
	"case_id" integer NOT NULL,
	"cause_id" integer NOT NULL,
	"is_primary" boolean DEFAULT true NOT NULL,
	CONSTRAINT "outcome_causes_case_id_cause_id_pk" PRIMARY KEY("case_id","cause_id")
);
--> statement-breakpoint
CREATE TABLE "outcome_parts" (
	"case_id" integer NOT NULL,
	"part_id" integer NOT NULL,
	"quantity" integer DEFAULT 1 NOT NULL,
	CONSTRAINT "outcome_parts_case_id_part_id_pk" PRIMARY KEY("case_id","part_id"),
	CONSTRAINT "outcome_parts_qty_check" CHECK ("outcome_parts"."quantity" > 0)
);
--> statement-breakpoint
CREATE TABLE "parts" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"sku" text NOT NULL,
	"unit_price_cents" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "parts_price_check" CHECK ("parts"."unit_price_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "practice_attempts" (
	"id" serial PRIMARY KEY NOT NULL,
	"trainee_id" text NOT NULL,
	"case_id" integer NOT NULL,
	"revealed_steps" integer DEFAULT 0 NOT NULL,
	"committed_cause_id" integer,
	"hit" boolean,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finished_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"id" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "settings" (
	"key" text PRIMARY KEY NOT NULL,
	"value" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"id" serial PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"succeeded" boolean NOT NULL,
	"ip" text,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tree_causes" (
	"version_id" integer NOT NULL,
	"cause_id" integer NOT NULL,
	"prior_weight" real DEFAULT 1 NOT NULL,
	CONSTRAINT "tree_causes_version_id_cause_id_pk" PRIMARY KEY("version_id","cause_id"),
	CONSTRAINT "tree_causes_weight_check" CHECK ("tree_causes"."prior_weight" >= 0)
);
--> statement-breakpoint
CREATE TABLE "tree_nodes" (
	"id" serial PRIMARY KEY NOT NULL,
	"version_id" integer NOT NULL,
	"key" text NOT NULL,
	"kind" text NOT NULL,
	"title" text DEFAULT '' NOT NULL,
	"prompt" text DEFAULT '' NOT NULL,
	"cost_minutes" integer DEFAULT 1 NOT NULL,
	"needs_opening" boolean DEFAULT false NOT NULL,
	"cause_id" integer,
	"caution_text" text DEFAULT '' NOT NULL,
	"pos_x" real DEFAULT 0 NOT NULL,
	"pos_y" real DEFAULT 0 NOT NULL,
	CONSTRAINT "tree_nodes_kind_check" CHECK ("tree_nodes"."kind" in ('question', 'check', 'cause', 'caution')),
	CONSTRAINT "tree_nodes_cost_check" CHECK ("tree_nodes"."cost_minutes" > 0)
);
--> statement-breakpoint
CREATE TABLE "tree_options" (
	"id" serial PRIMARY KEY NOT NULL,
	"version_id" integer NOT NULL,
	"key" text NOT NULL,
	"from_node_id" integer NOT NULL,
	"to_node_id" integer,
	"label" text NOT NULL,
	"dont_know" boolean DEFAULT false NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tree_scope" (
	"tree_id" integer NOT NULL,
	"family_id" integer NOT NULL,
	CONSTRAINT "tree_scope_tree_id_family_id_pk" PRIMARY KEY("tree_id","family_id")
);
--> statement-breakpoint
CREATE TABLE "tree_versions" (
	"id" serial PRIMARY KEY NOT NULL,
	"tree_id" integer NOT NULL,
	"number" integer NOT NULL,
	"state" text DEFAULT 'draft' NOT NULL,
	"root_key" text,
	"revision" integer DEFAULT 1 NOT NULL,
	"based_on_version_id" integer,
	"edited_by" text,
	"edited_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_by" text,
	"published_at" timestamp with time zone,
	"note" text DEFAULT '' NOT NULL,
	CONSTRAINT "tree_versions_state_check" CHECK ("tree_versions"."state" in ('draft', 'published'))
);
--> statement-breakpoint
CREATE TABLE "trees" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"symptom" text NOT NULL,
	"title" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"likelihood_mode" text DEFAULT 'authored' NOT NULL,
	"archived" boolean DEFAULT false NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trees_likelihood_mode_check" CHECK ("trees"."likelihood_mode" in ('authored', 'learned'))
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" text PRIMARY KEY NOT NULL,
	"storage_key" text NOT NULL,
	"original_name" text NOT NULL,
	"mime" text NOT NULL,
	"bytes" integer NOT NULL,
	"width" integer,
	"height" integer,
	"uploaded_by" text,
	"case_id" integer,
	"writeup_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" text PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" text NOT NULL,
	"password_hash" text NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_role_check" CHECK ("users"."role" in ('admin', 'lead', 'senior', 'tech', 'trainee'))
);
--> statement-breakpoint
CREATE TABLE "writeup_causes" (
	"writeup_id" integer NOT NULL,
	"cause_id" integer NOT NULL,
	CONSTRAINT "writeup_causes_writeup_id_cause_id_pk" PRIMARY KEY("writeup_id","cause_id")
);
--> statement-breakpoint
CREATE TABLE "writeup_families" (
	"writeup_id" integer NOT NULL,
	"family_id" integer NOT NULL,
	CONSTRAINT "writeup_families_writeup_id_family_id_pk" PRIMARY KEY("writeup_id","family_id")
);
--> statement-breakpoint
CREATE TABLE "writeup_parts" (
	"writeup_id" integer NOT NULL,
	"part_id" integer NOT NULL,
	CONSTRAINT "writeup_parts_writeup_id_part_id_pk" PRIMARY KEY("writeup_id","part_id")
);
--> statement-breakpoint
CREATE TABLE "writeups" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"title" text NOT NULL,
	"summary" text DEFAULT '' NOT NULL,
	"body" text DEFAULT '' NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"author_id" text,
	"case_id" integer,
	"tags" text[] DEFAULT '{}'::text[] NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_at" timestamp with time zone,
	"published_by" text,
	CONSTRAINT "writeups_status_check" CHECK ("writeups"."status" in ('draft', 'published'))
);
--> statement-breakpoint
ALTER TABLE "case_events" ADD CONSTRAINT "case_events_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_events" ADD CONSTRAINT "case_events_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_outcomes" ADD CONSTRAINT "case_outcomes_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_outcomes" ADD CONSTRAINT "case_outcomes_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_steps" ADD CONSTRAINT "case_steps_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_steps" ADD CONSTRAINT "case_steps_node_id_tree_nodes_id_fk" FOREIGN KEY ("node_id") REFERENCES "public"."tree_nodes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_steps" ADD CONSTRAINT "case_steps_option_id_tree_options_id_fk" FOREIGN KEY ("option_id") REFERENCES "public"."tree_options"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_steps" ADD CONSTRAINT "case_steps_answered_by_users_id_fk" FOREIGN KEY ("answered_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_family_id_motor_families_id_fk" FOREIGN KEY ("family_id") REFERENCES "public"."motor_families"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_tree_version_id_tree_versions_id_fk" FOREIGN KEY ("tree_version_id") REFERENCES "public"."tree_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_technician_id_users_id_fk" FOREIGN KEY ("technician_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cause_parts" ADD CONSTRAINT "cause_parts_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cause_parts" ADD CONSTRAINT "cause_parts_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "motor_families" ADD CONSTRAINT "motor_families_maker_id_motor_makers_id_fk" FOREIGN KEY ("maker_id") REFERENCES "public"."motor_makers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_evidence" ADD CONSTRAINT "option_evidence_option_id_tree_options_id_fk" FOREIGN KEY ("option_id") REFERENCES "public"."tree_options"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_evidence" ADD CONSTRAINT "option_evidence_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcome_causes" ADD CONSTRAINT "outcome_causes_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcome_causes" ADD CONSTRAINT "outcome_causes_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcome_parts" ADD CONSTRAINT "outcome_parts_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcome_parts" ADD CONSTRAINT "outcome_parts_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "practice_attempts" ADD CONSTRAINT "practice_attempts_trainee_id_users_id_fk" FOREIGN KEY ("trainee_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "practice_attempts" ADD CONSTRAINT "practice_attempts_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "practice_attempts" ADD CONSTRAINT "practice_attempts_committed_cause_id_causes_id_fk" FOREIGN KEY ("committed_cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_causes" ADD CONSTRAINT "tree_causes_version_id_tree_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."tree_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_causes" ADD CONSTRAINT "tree_causes_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_nodes" ADD CONSTRAINT "tree_nodes_version_id_tree_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."tree_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_nodes" ADD CONSTRAINT "tree_nodes_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_options" ADD CONSTRAINT "tree_options_version_id_tree_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."tree_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_options" ADD CONSTRAINT "tree_options_from_node_id_tree_nodes_id_fk" FOREIGN KEY ("from_node_id") REFERENCES "public"."tree_nodes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_options" ADD CONSTRAINT "tree_options_to_node_id_tree_nodes_id_fk" FOREIGN KEY ("to_node_id") REFERENCES "public"."tree_nodes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_scope" ADD CONSTRAINT "tree_scope_tree_id_trees_id_fk" FOREIGN KEY ("tree_id") REFERENCES "public"."trees"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_scope" ADD CONSTRAINT "tree_scope_family_id_motor_families_id_fk" FOREIGN KEY ("family_id") REFERENCES "public"."motor_families"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_versions" ADD CONSTRAINT "tree_versions_tree_id_trees_id_fk" FOREIGN KEY ("tree_id") REFERENCES "public"."trees"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_versions" ADD CONSTRAINT "tree_versions_edited_by_users_id_fk" FOREIGN KEY ("edited_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tree_versions" ADD CONSTRAINT "tree_versions_published_by_users_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trees" ADD CONSTRAINT "trees_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_writeup_id_writeups_id_fk" FOREIGN KEY ("writeup_id") REFERENCES "public"."writeups"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeup_causes" ADD CONSTRAINT "writeup_causes_writeup_id_writeups_id_fk" FOREIGN KEY ("writeup_id") REFERENCES "public"."writeups"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeup_causes" ADD CONSTRAINT "writeup_causes_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeup_families" ADD CONSTRAINT "writeup_families_writeup_id_writeups_id_fk" FOREIGN KEY ("writeup_id") REFERENCES "public"."writeups"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeup_families" ADD CONSTRAINT "writeup_families_family_id_motor_families_id_fk" FOREIGN KEY ("family_id") REFERENCES "public"."motor_families"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeup_parts" ADD CONSTRAINT "writeup_parts_writeup_id_writeups_id_fk" FOREIGN KEY ("writeup_id") REFERENCES "public"."writeups"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeup_parts" ADD CONSTRAINT "writeup_parts_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeups" ADD CONSTRAINT "writeups_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeups" ADD CONSTRAINT "writeups_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "writeups" ADD CONSTRAINT "writeups_published_by_users_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "case_events_case_idx" ON "case_events" USING btree ("case_id");--> statement-breakpoint
CREATE UNIQUE INDEX "case_steps_seq_key" ON "case_steps" USING btree ("case_id","seq");--> statement-breakpoint
CREATE UNIQUE INDEX "cases_reference_key" ON "cases" USING btree ("reference");--> statement-breakpoint
CREATE INDEX "cases_status_created_idx" ON "cases" USING btree ("status","created_at");--> statement-breakpoint
CREATE INDEX "cases_family_closed_idx" ON "cases" USING btree ("family_id","closed_at");--> statement-breakpoint
CREATE INDEX "cases_technician_idx" ON "cases" USING btree ("technician_id");--> statement-breakpoint
CREATE INDEX "cases_serial_idx" ON "cases" USING btree ("serial");--> statement-breakpoint
CREATE INDEX "cases_version_idx" ON "cases" USING btree ("tree_version_id");--> statement-breakpoint
CREATE UNIQUE INDEX "causes_slug_key" ON "causes" USING btree ("slug");--> statement-breakpoint
CREATE INDEX "mail_outbox_due_idx" ON "mail_outbox" USING btree ("status","next_attempt_at");--> statement-breakpoint
CREATE UNIQUE INDEX "motor_families_slug_key" ON "motor_families" USING btree ("slug");--> statement-breakpoint
CREATE INDEX "motor_families_maker_idx" ON "motor_families" USING btree ("maker_id");--> statement-breakpoint
CREATE UNIQUE INDEX "motor_makers_slug_key" ON "motor_makers" USING btree ("slug");--> statement-breakpoint
CREATE INDEX "outcome_causes_cause_idx" ON "outcome_causes" USING btree ("cause_id");--> statement-breakpoint
CREATE INDEX "outcome_parts_part_idx" ON "outcome_parts" USING btree ("part_id");--> statement-breakpoint
CREATE UNIQUE INDEX "parts_slug_key" ON "parts" USING btree ("slug");--> statement-breakpoint
CREATE UNIQUE INDEX "parts_sku_key" ON "parts" USING btree ("sku");--> statement-breakpoint
CREATE INDEX "practice_attempts_trainee_idx" ON "practice_attempts" USING btree ("trainee_id");--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_email_at_idx" ON "sign_in_attempts" USING btree ("email","at");--> statement-breakpoint
CREATE UNIQUE INDEX "tree_nodes_key" ON "tree_nodes" USING btree ("version_id","key");--> statement-breakpoint
CREATE UNIQUE INDEX "tree_options_key" ON "tree_options" USING btree ("version_id","key");--> statement-breakpoint
CREATE INDEX "tree_options_from_idx" ON "tree_options" USING btree ("from_node_id");--> statement-breakpoint
CREATE INDEX "tree_scope_family_idx" ON "tree_scope" USING btree ("family_id");--> statement-breakpoint
CREATE UNIQUE INDEX "tree_versions_number_key" ON "tree_versions" USING btree ("tree_id","number");--> statement-breakpoint
CREATE UNIQUE INDEX "tree_versions_one_draft_key" ON "tree_versions" USING btree ("tree_id") WHERE "tree_versions"."state" = 'draft';--> statement-breakpoint
CREATE UNIQUE INDEX "trees_slug_key" ON "trees" USING btree ("slug");--> statement-breakpoint
CREATE INDEX "uploads_case_idx" ON "uploads" USING btree ("case_id");--> statement-breakpoint
CREATE INDEX "uploads_writeup_idx" ON "uploads" USING btree ("writeup_id");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");--> statement-breakpoint
CREATE INDEX "writeup_causes_cause_idx" ON "writeup_causes" USING btree ("cause_id");--> statement-breakpoint
CREATE UNIQUE INDEX "writeups_slug_key" ON "writeups" USING btree ("slug");--> statement-breakpoint
CREATE INDEX "writeups_status_idx" ON "writeups" USING btree ("status","published_at");