DROP INDEX "page_metrics_inbound_idx";--> statement-breakpoint
DROP INDEX "page_metrics_outbound_idx";--> statement-breakpoint
DROP INDEX "page_metrics_depth_idx";--> statement-breakpoint
CREATE INDEX "page_metrics_inbound_idx" ON "page_metrics" USING btree ("run_id","inbound_count","rank");--> statement-breakpoint
CREATE INDEX "page_metrics_outbound_idx" ON "page_metrics" USING btree ("run_id","outbound_count","rank");--> statement-breakpoint
CREATE INDEX "page_metrics_depth_idx" ON "page_metrics" USING btree ("run_id","depth","rank");