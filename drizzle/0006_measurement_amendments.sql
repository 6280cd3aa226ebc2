CREATE TABLE "measurement_amendments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"operation_id" uuid NOT NULL,
	"key" text NOT NULL,
	"previous_value_si" double precision NOT NULL,
	"previous_passed" boolean NOT NULL,
	"value_si" double precision NOT NULL,
	"passed" boolean NOT NULL,
	"reason" text NOT NULL,
	"amended_by_id" uuid NOT NULL,
	"amended_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "measurement_amendments" ADD CONSTRAINT "measurement_amendments_operation_id_operations_id_fk" FOREIGN KEY ("operation_id") REFERENCES "public"."operations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurement_amendments" ADD CONSTRAINT "measurement_amendments_amended_by_id_users_id_fk" FOREIGN KEY ("amended_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;