CREATE TABLE "digest_deliveries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"doc_set_id" uuid NOT NULL,
	"run_id" uuid NOT NULL,
	"against_run_id" uuid,
	"outbox_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notification_settings" (
	"user_id" uuid PRIMARY KEY NOT NULL,
	"time_zone" text,
	"digest" boolean DEFAULT true NOT NULL,
	"task_assigned" boolean DEFAULT true NOT NULL,
	"task_reopened" boolean DEFAULT true NOT NULL,
	"pruning_waiting" boolean DEFAULT true NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "runs" ADD COLUMN "number" integer;--> statement-breakpoint
ALTER TABLE "mailbox_messages" ADD COLUMN "headers" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "outbox" ADD COLUMN "headers" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "subscriptions" ADD COLUMN "pruning_waiting" boolean;--> statement-breakpoint
ALTER TABLE "task_events" ADD COLUMN "run_id" uuid;--> statement-breakpoint
ALTER TABLE "tasks" ADD COLUMN "last_check" jsonb;--> statement-breakpoint
ALTER TABLE "digest_deliveries" ADD CONSTRAINT "digest_deliveries_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "digest_deliveries" ADD CONSTRAINT "digest_deliveries_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "digest_deliveries" ADD CONSTRAINT "digest_deliveries_run_id_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notification_settings" ADD CONSTRAINT "notification_settings_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "digest_deliveries_once" ON "digest_deliveries" USING btree ("user_id","run_id");--> statement-breakpoint
CREATE INDEX "digest_deliveries_cursor_idx" ON "digest_deliveries" USING btree ("user_id","doc_set_id","created_at");--> statement-breakpoint
CREATE INDEX "digest_deliveries_run_idx" ON "digest_deliveries" USING btree ("run_id");--> statement-breakpoint
CREATE INDEX "task_events_run_idx" ON "task_events" USING btree ("run_id");--> statement-breakpoint
-- Existing runs get their numbers in the order they were queued, per doc set.
UPDATE "runs" SET "number" = numbered.n FROM (
	SELECT "id", row_number() OVER (PARTITION BY "doc_set_id" ORDER BY "created_at", "id") AS n FROM "runs"
) AS numbered WHERE "runs"."id" = numbered."id";
