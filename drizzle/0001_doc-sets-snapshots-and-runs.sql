CREATE TABLE "doc_sets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"settings" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "assets" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"snapshot_id" uuid NOT NULL,
	"path" text NOT NULL,
	"bytes" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "links" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"snapshot_id" uuid NOT NULL,
	"source_page_id" bigint NOT NULL,
	"line" integer NOT NULL,
	"column" integer NOT NULL,
	"href" text NOT NULL,
	"kind" text NOT NULL,
	"status" text NOT NULL,
	"target_page_id" bigint,
	"target_path" text,
	"target_is_asset" boolean DEFAULT false NOT NULL,
	"anchor" text,
	"reason" text,
	"flags" text[] DEFAULT '{}'::text[] NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pages" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"snapshot_id" uuid NOT NULL,
	"path" text NOT NULL,
	"title" text NOT NULL,
	"content_hash" text NOT NULL,
	"word_count" integer DEFAULT 0 NOT NULL,
	"owner_email" text,
	"reviewed_at" text,
	"protected" boolean DEFAULT false NOT NULL,
	"facts" jsonb NOT NULL,
	"raw_links" jsonb NOT NULL,
	"text" text DEFAULT '' NOT NULL,
	"search" "tsvector" GENERATED ALWAYS AS (setweight(to_tsvector('english', coalesce(title, '')), 'A') || setweight(to_tsvector('english', coalesce(facts->>'headingText', '')), 'B') || setweight(to_tsvector('english', left(coalesce(text, ''), 200000)), 'C')) STORED
);
--> statement-breakpoint
CREATE TABLE "snapshots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"doc_set_id" uuid NOT NULL,
	"status" text DEFAULT 'received' NOT NULL,
	"source" text NOT NULL,
	"label" text,
	"progress_done" integer DEFAULT 0 NOT NULL,
	"progress_total" integer DEFAULT 0 NOT NULL,
	"error_code" text,
	"error" text,
	"page_count" integer DEFAULT 0 NOT NULL,
	"link_count" integer DEFAULT 0 NOT NULL,
	"asset_count" integer DEFAULT 0 NOT NULL,
	"reused_page_count" integer DEFAULT 0 NOT NULL,
	"warnings" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"ignored" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"archive_sha256" text,
	"archive_bytes" integer,
	"import_ms" integer,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finished_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "link_suggestions" (
	"run_id" uuid NOT NULL,
	"target_page_id" bigint NOT NULL,
	"source_page_id" bigint NOT NULL,
	"score_gain" double precision NOT NULL,
	"reason" text NOT NULL,
	"position" integer NOT NULL,
	CONSTRAINT "link_suggestions_run_id_target_page_id_source_page_id_pk" PRIMARY KEY("run_id","target_page_id","source_page_id")
);
--> statement-breakpoint
CREATE TABLE "page_metrics" (
	"run_id" uuid NOT NULL,
	"page_id" bigint NOT NULL,
	"path" text NOT NULL,
	"title" text NOT NULL,
	"stationary_score" double precision NOT NULL,
	"times_average" double precision NOT NULL,
	"rank" integer NOT NULL,
	"inbound_count" integer NOT NULL,
	"outbound_count" integer NOT NULL,
	"depth" integer,
	"reachable" boolean NOT NULL,
	"orphan" boolean NOT NULL,
	"dead_end" boolean NOT NULL,
	"deep" boolean NOT NULL,
	"island_id" integer,
	"broken_link_count" integer DEFAULT 0 NOT NULL,
	"word_count" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "page_metrics_run_id_page_id_pk" PRIMARY KEY("run_id","page_id")
);
--> statement-breakpoint
CREATE TABLE "runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"doc_set_id" uuid NOT NULL,
	"snapshot_id" uuid NOT NULL,
	"status" text DEFAULT 'queued' NOT NULL,
	"trigger" text NOT NULL,
	"settings" jsonb NOT NULL,
	"iterations" integer,
	"residual" double precision,
	"duration_ms" integer,
	"counts" jsonb,
	"error" text,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "doc_sets" ADD CONSTRAINT "doc_sets_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assets" ADD CONSTRAINT "assets_snapshot_id_snapshots_id_fk" FOREIGN KEY ("snapshot_id") REFERENCES "public"."snapshots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "links" ADD CONSTRAINT "links_snapshot_id_snapshots_id_fk" FOREIGN KEY ("snapshot_id") REFERENCES "public"."snapshots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pages" ADD CONSTRAINT "pages_snapshot_id_snapshots_id_fk" FOREIGN KEY ("snapshot_id") REFERENCES "public"."snapshots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "snapshots" ADD CONSTRAINT "snapshots_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "snapshots" ADD CONSTRAINT "snapshots_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "link_suggestions" ADD CONSTRAINT "link_suggestions_run_id_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_metrics" ADD CONSTRAINT "page_metrics_run_id_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "runs" ADD CONSTRAINT "runs_doc_set_id_doc_sets_id_fk" FOREIGN KEY ("doc_set_id") REFERENCES "public"."doc_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "runs" ADD CONSTRAINT "runs_snapshot_id_snapshots_id_fk" FOREIGN KEY ("snapshot_id") REFERENCES "public"."snapshots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "runs" ADD CONSTRAINT "runs_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "doc_sets_name_idx" ON "doc_sets" USING btree ("name");--> statement-breakpoint
CREATE UNIQUE INDEX "assets_snapshot_path_unique" ON "assets" USING btree ("snapshot_id","path");--> statement-breakpoint
CREATE INDEX "links_snapshot_source_idx" ON "links" USING btree ("snapshot_id","source_page_id");--> statement-breakpoint
CREATE INDEX "links_snapshot_target_idx" ON "links" USING btree ("snapshot_id","target_page_id");--> statement-breakpoint
CREATE INDEX "links_snapshot_status_idx" ON "links" USING btree ("snapshot_id","status");--> statement-breakpoint
CREATE UNIQUE INDEX "pages_snapshot_path_unique" ON "pages" USING btree ("snapshot_id","path");--> statement-breakpoint
CREATE INDEX "pages_snapshot_hash_idx" ON "pages" USING btree ("snapshot_id","content_hash");--> statement-breakpoint
CREATE INDEX "pages_search_idx" ON "pages" USING gin ("search");--> statement-breakpoint
CREATE INDEX "snapshots_doc_set_idx" ON "snapshots" USING btree ("doc_set_id","created_at");--> statement-breakpoint
CREATE INDEX "snapshots_status_idx" ON "snapshots" USING btree ("status");--> statement-breakpoint
CREATE INDEX "page_metrics_rank_idx" ON "page_metrics" USING btree ("run_id","rank");--> statement-breakpoint
CREATE INDEX "page_metrics_path_idx" ON "page_metrics" USING btree ("run_id","path");--> statement-breakpoint
CREATE INDEX "page_metrics_inbound_idx" ON "page_metrics" USING btree ("run_id","inbound_count");--> statement-breakpoint
CREATE INDEX "page_metrics_outbound_idx" ON "page_metrics" USING btree ("run_id","outbound_count");--> statement-breakpoint
CREATE INDEX "page_metrics_depth_idx" ON "page_metrics" USING btree ("run_id","depth");--> statement-breakpoint
CREATE INDEX "runs_doc_set_idx" ON "runs" USING btree ("doc_set_id","created_at");--> statement-breakpoint
CREATE INDEX "runs_status_idx" ON "runs" USING btree ("status");