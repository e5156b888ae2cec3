CREATE TABLE "custom_devices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organization_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"rating_a" double precision NOT NULL,
	"dc_voltage_rating_v" double precision,
	"interrupting_rating_a" double precision,
	"ignition_protected" boolean DEFAULT false NOT NULL,
	"time_delay" boolean DEFAULT false NOT NULL,
	"points" jsonb NOT NULL,
	"source" text NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "custom_devices" ADD CONSTRAINT "custom_devices_organization_id_organizations_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organizations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "custom_devices" ADD CONSTRAINT "custom_devices_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "custom_devices_org_idx" ON "custom_devices" USING btree ("organization_id","name");