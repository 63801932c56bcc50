CREATE TYPE "public"."reference_layer_kind" AS ENUM('lease_blocks', 'survey_outlines', 'faults', 'bathymetry', 'other');--> statement-breakpoint
CREATE TABLE "offset_picks" (
	"planned_well_id" uuid NOT NULL,
	"well_id" uuid NOT NULL,
	"reason" text,
	"added_by" uuid,
	"added_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "offset_picks_planned_well_id_well_id_pk" PRIMARY KEY("planned_well_id","well_id")
);
--> statement-breakpoint
CREATE TABLE "planned_wells" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"prospect_id" uuid,
	"name" text NOT NULL,
	"location" geometry(Point,4326) NOT NULL,
	"datum_elevation_m" double precision DEFAULT 25 NOT NULL,
	"water_depth_m" double precision,
	"water_depth_source" text DEFAULT 'entered' NOT NULL,
	"planned_td_m" double precision NOT NULL,
	"notes" text,
	"created_by" uuid,
	"updated_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "prospects" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"outline" geometry(Polygon,4326) NOT NULL,
	"target_top_m" double precision,
	"target_base_m" double precision,
	"notes" text,
	"created_by" uuid,
	"updated_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reference_features" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"layer_id" uuid NOT NULL,
	"geom" geometry(Geometry,4326) NOT NULL,
	"properties" jsonb DEFAULT '{}'::jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reference_layers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" "reference_layer_kind" DEFAULT 'other' NOT NULL,
	"color" text DEFAULT '#6b7f99' NOT NULL,
	"file_name" text NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "offset_picks" ADD CONSTRAINT "offset_picks_planned_well_id_planned_wells_id_fk" FOREIGN KEY ("planned_well_id") REFERENCES "public"."planned_wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offset_picks" ADD CONSTRAINT "offset_picks_well_id_wells_id_fk" FOREIGN KEY ("well_id") REFERENCES "public"."wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offset_picks" ADD CONSTRAINT "offset_picks_added_by_users_id_fk" FOREIGN KEY ("added_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "planned_wells" ADD CONSTRAINT "planned_wells_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "planned_wells" ADD CONSTRAINT "planned_wells_prospect_id_prospects_id_fk" FOREIGN KEY ("prospect_id") REFERENCES "public"."prospects"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "planned_wells" ADD CONSTRAINT "planned_wells_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "planned_wells" ADD CONSTRAINT "planned_wells_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "prospects" ADD CONSTRAINT "prospects_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "prospects" ADD CONSTRAINT "prospects_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "prospects" ADD CONSTRAINT "prospects_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reference_features" ADD CONSTRAINT "reference_features_layer_id_reference_layers_id_fk" FOREIGN KEY ("layer_id") REFERENCES "public"."reference_layers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reference_layers" ADD CONSTRAINT "reference_layers_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reference_layers" ADD CONSTRAINT "reference_layers_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "planned_wells_location_gist" ON "planned_wells" USING gist ("location");--> statement-breakpoint
CREATE INDEX "planned_wells_team_id_index" ON "planned_wells" USING btree ("team_id");--> statement-breakpoint
CREATE INDEX "prospects_outline_gist" ON "prospects" USING gist ("outline");--> statement-breakpoint
CREATE INDEX "prospects_team_id_index" ON "prospects" USING btree ("team_id");--> statement-breakpoint
CREATE INDEX "reference_features_geom_gist" ON "reference_features" USING gist ("geom");--> statement-breakpoint
CREATE INDEX "reference_features_layer_id_index" ON "reference_features" USING btree ("layer_id");--> statement-breakpoint
CREATE INDEX "reference_layers_team_id_index" ON "reference_layers" USING btree ("team_id");