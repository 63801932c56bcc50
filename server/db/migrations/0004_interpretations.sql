CREATE TYPE "public"."interpretation_status" AS ENUM('draft', 'accepted');--> statement-breakpoint
CREATE TABLE "interpretations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"well_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"status" "interpretation_status" NOT NULL,
	"content" jsonb NOT NULL,
	"note" text,
	"restored_from" integer,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "interpretations" ADD CONSTRAINT "interpretations_well_id_wells_id_fk" FOREIGN KEY ("well_id") REFERENCES "public"."wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "interpretations" ADD CONSTRAINT "interpretations_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "interpretations_well_version_unique" ON "interpretations" USING btree ("well_id","version");--> statement-breakpoint
CREATE INDEX "interpretations_well_id_status_index" ON "interpretations" USING btree ("well_id","status");