CREATE TABLE "log_mappings" (
	"header" text PRIMARY KEY NOT NULL,
	"mapping" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tuning_logs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"job_id" uuid NOT NULL,
	"revision_number" integer NOT NULL,
	"file_name" text NOT NULL,
	"storage_key" text NOT NULL,
	"byte_size" integer NOT NULL,
	"mapping" jsonb NOT NULL,
	"total_rows" integer NOT NULL,
	"used_rows" integer NOT NULL,
	"set_aside" jsonb NOT NULL,
	"rejected" jsonb NOT NULL,
	"rejected_count" integer NOT NULL,
	"analysis" jsonb NOT NULL,
	"uploaded_by_id" uuid NOT NULL,
	"uploaded_at" timestamp with time zone DEFAULT now() NOT NULL,
	"accepted_by_id" uuid,
	"accepted_at" timestamp with time zone,
	"accepted_changes" jsonb,
	"next_revision_number" integer,
	CONSTRAINT "tuning_logs_storage_key_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "full_throttle_above_pct" double precision;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "log_bin_width_pa" double precision;--> statement-breakpoint
ALTER TABLE "tuning_logs" ADD CONSTRAINT "tuning_logs_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tuning_logs" ADD CONSTRAINT "tuning_logs_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tuning_logs" ADD CONSTRAINT "tuning_logs_accepted_by_id_users_id_fk" FOREIGN KEY ("accepted_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;