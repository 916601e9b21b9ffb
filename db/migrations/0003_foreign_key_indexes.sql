CREATE INDEX "case_steps_node_idx" ON "case_steps" USING btree ("node_id");--> statement-breakpoint
CREATE INDEX "case_steps_option_idx" ON "case_steps" USING btree ("option_id");--> statement-breakpoint
CREATE INDEX "tree_options_to_idx" ON "tree_options" USING btree ("to_node_id");