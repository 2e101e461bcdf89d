CREATE TABLE "pruning_candidates" (
	"doc_set_id" uuid NOT NULL,
	"path" text NOT NULL,
	"run_id" uuid,
	"title" text DEFAULT '' NOT NULL,
	"reasons" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"inbound_count" integer,
	"stationary_score" double precision,
	"word_count" integer,
	"reviewed_at" text,
	"in_latest_run" boolean DEFAULT true NOT NULL,
	"first_proposed_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "pruning_candidates_doc_set_id_path_pk" PRIMARY KEY("doc_set_id","path")
);
--> statement-breakpoint
CREATE TABLE "pruning_decisions" (
	"doc_set_id" uuid NOT NULL,
	"path" text NOT NULL,
	"decision" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"decided_by" uuid,
	"decided_by_name" text NOT NULL,
	"decided_at" timestamp with time zone DEFAULT now() NOT NULL,
	"inbound_at_decision" integer,
	"flagged_at" timestamp with time zone,
	"flag_reason" text,
	CONSTRAINT "pruning_decisions_doc_set_id_path_pk" PRIMARY KEY("doc_set_id","path")
);
--> statement-breakpoint
CREATE TABLE "pruning_lists" (
	"doc_set_id" uuid PRIMARY KEY NOT NULL,
	"version" integer DEFAULT 0 NOT NULL,
	"run_id" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pruning_nominations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"doc_set_id" uuid NOT NULL,
	"path" text NOT NULL,
	"reason" text NOT NULL,
	"nominated_by" uuid,
	"nominated_by_name" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "task_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"task_id" uuid NOT NULL,
	"type" text NOT NULL,
	"actor_id" uuid,
	"actor_name" text NOT NULL,
	"body" text DEFAULT '' NOT NULL,
	"changes" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tasks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"doc_set_id" uuid NOT NULL,
	"page_path" text NOT NULL,
	"kind" text NOT NULL,
	"title" text NOT NULL,
	"details" text DEFAULT '' NOT NULL,
	"finding" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"assignee_id" uuid,
	"priority" text DEFAULT 'normal' NOT NULL,
	"due_date" text,
	"status" text DEFAULT 'open' NOT NULL,
	"verification" text,
	"verified_run_id" uuid,
	"verified_at" timestamp with time zone,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "pruning_candidates" ADD CONSTRAINT "pruning_candidates_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pruning_decisions" ADD CONSTRAINT "pruning_decisions_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pruning_decisions" ADD CONSTRAINT "pruning_decisions_decided_by_users_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pruning_lists" ADD CONSTRAINT "pruning_lists_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pruning_nominations" ADD CONSTRAINT "pruning_nominations_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pruning_nominations" ADD CONSTRAINT "pruning_nominations_nominated_by_users_id_fk" FOREIGN KEY ("nominated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_events" ADD CONSTRAINT "task_events_task_id_tasks_id_fk" FOREIGN KEY ("task_id") REFERENCES "public"."tasks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_events" ADD CONSTRAINT "task_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_assignee_id_users_id_fk" FOREIGN KEY ("assignee_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "pruning_nominations_path_idx" ON "pruning_nominations" USING btree ("doc_set_id","path");--> statement-breakpoint
CREATE UNIQUE INDEX "pruning_nominations_once" ON "pruning_nominations" USING btree ("doc_set_id","path","nominated_by");--> statement-breakpoint
CREATE INDEX "task_events_task_idx" ON "task_events" USING btree ("task_id","at");--> statement-breakpoint
CREATE INDEX "tasks_doc_set_path_idx" ON "tasks" USING btree ("doc_set_id","page_path");--> statement-breakpoint
CREATE INDEX "tasks_assignee_status_idx" ON "tasks" USING btree ("assignee_id","status");--> statement-breakpoint
CREATE INDEX "tasks_status_due_idx" ON "tasks" USING btree ("status","due_date");