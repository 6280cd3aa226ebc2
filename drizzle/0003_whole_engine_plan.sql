CREATE TABLE "shop_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"min_restriction_drill_label" text,
	"max_restriction_drill_label" text,
	"min_web_m" double precision,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "enrichment_stages" ADD COLUMN "mode" text DEFAULT 'full' NOT NULL;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "ambient_pressure_pa" double precision DEFAULT 101325 NOT NULL;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "site_elevation_m" double precision;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "cruise_lambda" double precision DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "drill_system" text DEFAULT 'inch' NOT NULL;--> statement-breakpoint
ALTER TABLE "metering_blocks" ADD COLUMN "tube_max_rearward_m" double precision;--> statement-breakpoint
ALTER TABLE "metering_blocks" ADD COLUMN "tube_max_downward_m" double precision;--> statement-breakpoint
ALTER TABLE "plan_revisions" ADD COLUMN "acknowledged_warnings" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
-- A primary block's stages were read in part throttle (the primary meters alone there).
UPDATE "enrichment_stages" SET "mode" = 'part' WHERE "block_id" IN (SELECT "id" FROM "metering_blocks" WHERE "side" = 'primary');
