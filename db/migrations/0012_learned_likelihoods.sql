CREATE TABLE "learned_likelihoods" (
	"version_id" integer PRIMARY KEY NOT NULL,
	"cases" integer NOT NULL,
	"likelihoods" jsonb NOT NULL,
	"learned_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "learned_likelihoods" ADD CONSTRAINT "learned_likelihoods_version_id_tree_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."tree_versions"("id") ON DELETE cascade ON UPDATE no action;