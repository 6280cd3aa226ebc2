CREATE TABLE "deliveries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"job_id" uuid NOT NULL,
	"revision_number" integer NOT NULL,
	"handed_over_by_id" uuid NOT NULL,
	"handed_to" text NOT NULL,
	"delivered_at" timestamp with time zone DEFAULT now() NOT NULL,
	"record_mailed_to" text,
	CONSTRAINT "deliveries_job_revision" UNIQUE("job_id","revision_number")
);
--> statement-breakpoint
ALTER TABLE "deliveries" ADD CONSTRAINT "deliveries_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "deliveries" ADD CONSTRAINT "deliveries_handed_over_by_id_users_id_fk" FOREIGN KEY ("handed_over_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;