CREATE TYPE "public"."carburetor_side" AS ENUM('primary', 'secondary');--> statement-breakpoint
CREATE TYPE "public"."job_state" AS ENUM('draft', 'planned', 'released', 'machining', 'verified', 'delivered');--> statement-breakpoint
CREATE TABLE "attachments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"block_id" uuid NOT NULL,
	"operation_id" uuid,
	"storage_key" text NOT NULL,
	"content_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"uploaded_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachments_storage_key_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
CREATE TABLE "customers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"email" text,
	"phone" text,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "enrichment_stages" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"block_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"valve_kind" text NOT NULL,
	"vacuum_rating_pa" double precision,
	"setpoint_pa" double precision,
	"target_kind" text NOT NULL,
	"target_from" double precision,
	"target_to" double precision NOT NULL,
	"valve_window_area_m2" double precision,
	"max_holes" integer DEFAULT 4 NOT NULL,
	"chosen_count" integer,
	"chosen_drill_label" text
);
--> statement-breakpoint
CREATE TABLE "jobs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"number" text NOT NULL,
	"customer_id" uuid NOT NULL,
	"tuner_id" uuid NOT NULL,
	"state" "job_state" DEFAULT 'draft' NOT NULL,
	"carburetor" text NOT NULL,
	"displacement_m3" double precision NOT NULL,
	"fuel_kind" text NOT NULL,
	"fuel_ethanol_pct" double precision,
	"fuel_density_kg_m3" double precision,
	"fuel_stoich_afr" double precision,
	"target_power_w" double precision,
	"peak_boost_pa" double precision NOT NULL,
	"target_lambda_atmosphere" double precision DEFAULT 0.88 NOT NULL,
	"target_lambda_peak" double precision DEFAULT 0.78 NOT NULL,
	"intercooled" boolean DEFAULT false NOT NULL,
	"charge_temperature_k" double precision,
	"ambient_temperature_k" double precision DEFAULT 298.15 NOT NULL,
	"compressor_efficiency" double precision DEFAULT 0.7 NOT NULL,
	"intercooler_effectiveness" double precision DEFAULT 0.7 NOT NULL,
	"use_all_drills" boolean DEFAULT false NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"current_revision" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "jobs_number_unique" UNIQUE("number")
);
--> statement-breakpoint
CREATE TABLE "measurements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"operation_id" uuid NOT NULL,
	"key" text NOT NULL,
	"value_si" double precision NOT NULL,
	"passed" boolean NOT NULL,
	"recorded_by_id" uuid NOT NULL,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "measurements_operation_key" UNIQUE("operation_id","key")
);
--> statement-breakpoint
CREATE TABLE "metering_blocks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"job_id" uuid NOT NULL,
	"side" "carburetor_side" NOT NULL,
	"main_jet_diameter_m" double precision NOT NULL,
	"main_jet_count" integer DEFAULT 2 NOT NULL,
	"channel_length_m" double precision,
	"min_web_m" double precision,
	"passage_diameter_m" double precision,
	"passage_wall_m" double precision,
	"passage_depth_m" double precision,
	"valve_protrusion_m" double precision,
	"running_clearance_m" double precision,
	"measured_gap_m" double precision,
	"boss_wall_m" double precision,
	"tube_runs_m" jsonb,
	"tube_bend_deg" double precision,
	"tube_bend_radius_m" double precision,
	"tube_swage_m" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "metering_blocks_job_side" UNIQUE("job_id","side")
);
--> statement-breakpoint
CREATE TABLE "operations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"revision_id" uuid NOT NULL,
	"block_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"kind" text NOT NULL,
	"title" text NOT NULL,
	"instructions" text NOT NULL,
	"parameters" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"measurements" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"caution" text,
	CONSTRAINT "operations_revision_block_number" UNIQUE("revision_id","block_id","number")
);
--> statement-breakpoint
CREATE TABLE "plan_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"job_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"status" text DEFAULT 'current' NOT NULL,
	"snapshot" jsonb NOT NULL,
	"approved_by_id" uuid NOT NULL,
	"approved_at" timestamp with time zone DEFAULT now() NOT NULL,
	"released_by_id" uuid,
	"released_at" timestamp with time zone,
	"superseded_at" timestamp with time zone,
	CONSTRAINT "plan_revisions_job_number" UNIQUE("job_id","number")
);
--> statement-breakpoint
CREATE TABLE "sign_offs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"operation_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"signed_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sign_offs_operation_id_unique" UNIQUE("operation_id")
);
--> statement-breakpoint
CREATE TABLE "stocked_drills" (
	"label" text PRIMARY KEY NOT NULL,
	"added_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_block_id_metering_blocks_id_fk" FOREIGN KEY ("block_id") REFERENCES "public"."metering_blocks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_operation_id_operations_id_fk" FOREIGN KEY ("operation_id") REFERENCES "public"."operations"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "enrichment_stages" ADD CONSTRAINT "enrichment_stages_block_id_metering_blocks_id_fk" FOREIGN KEY ("block_id") REFERENCES "public"."metering_blocks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_tuner_id_users_id_fk" FOREIGN KEY ("tuner_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_operation_id_operations_id_fk" FOREIGN KEY ("operation_id") REFERENCES "public"."operations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "metering_blocks" ADD CONSTRAINT "metering_blocks_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "operations" ADD CONSTRAINT "operations_revision_id_plan_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."plan_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "operations" ADD CONSTRAINT "operations_block_id_metering_blocks_id_fk" FOREIGN KEY ("block_id") REFERENCES "public"."metering_blocks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_revisions" ADD CONSTRAINT "plan_revisions_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_revisions" ADD CONSTRAINT "plan_revisions_approved_by_id_users_id_fk" FOREIGN KEY ("approved_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_revisions" ADD CONSTRAINT "plan_revisions_released_by_id_users_id_fk" FOREIGN KEY ("released_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sign_offs" ADD CONSTRAINT "sign_offs_operation_id_operations_id_fk" FOREIGN KEY ("operation_id") REFERENCES "public"."operations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sign_offs" ADD CONSTRAINT "sign_offs_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "jobs_state" ON "jobs" USING btree ("state");--> statement-breakpoint
CREATE INDEX "jobs_customer" ON "jobs" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "jobs_tuner" ON "jobs" USING btree ("tuner_id");