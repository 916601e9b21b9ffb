ALTER TABLE "trees" DROP CONSTRAINT "trees_likelihood_mode_check";--> statement-breakpoint
ALTER TABLE "trees" ALTER COLUMN "likelihood_mode" SET DEFAULT 'auto';--> statement-breakpoint
ALTER TABLE "trees" ADD CONSTRAINT "trees_likelihood_mode_check" CHECK ("trees"."likelihood_mode" in ('auto', 'authored', 'learned'));