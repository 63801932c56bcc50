CREATE TYPE "public"."import_kind" AS ENUM('wells', 'surveys', 'pressures', 'tops', 'las');--> statement-breakpoint
CREATE TYPE "public"."well_status" AS ENUM('planned', 'drilling', 'drilled', 'abandoned', 'suspended');--> statement-breakpoint
CREATE TYPE "public"."curve_role" AS ENUM('sonic', 'resistivity', 'density', 'gamma', 'caliper', 'neutron', 'porosity', 'other');--> statement-breakpoint
CREATE TYPE "public"."pressure_kind" AS ENUM('formation_test', 'dst', 'kick', 'loss', 'mud_weight', 'lot', 'fit', 'pp_estimate', 'other');--> statement-breakpoint
CREATE TYPE "public"."pressure_quality" AS ENUM('good', 'tight', 'supercharged', 'doubtful', 'unknown');--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"kind" "import_kind" NOT NULL,
	"file_name" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"sha256" text NOT NULL,
	"content" "bytea" NOT NULL,
	"outcome" jsonb NOT NULL,
	"mapping" jsonb,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "wells" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"uwi" text,
	"operator" text,
	"location" geometry(Point,4326) NOT NULL,
	"surface_x" double precision NOT NULL,
	"surface_y" double precision NOT NULL,
	"surface_epsg" integer DEFAULT 4326 NOT NULL,
	"datum_elevation_m" double precision DEFAULT 0 NOT NULL,
	"datum_kind" text DEFAULT 'RT' NOT NULL,
	"ground_elevation_m" double precision,
	"water_depth_m" double precision,
	"air_gap_m" double precision,
	"offshore" boolean DEFAULT false NOT NULL,
	"spud_date" date,
	"td_md_m" double precision,
	"td_tvd_m" double precision,
	"status" "well_status" DEFAULT 'drilled' NOT NULL,
	"note" text,
	"extra" jsonb,
	"created_upload_id" uuid,
	"updated_upload_id" uuid,
	"created_by" uuid,
	"updated_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "formation_tops" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"well_id" uuid NOT NULL,
	"name" text NOT NULL,
	"md_m" double precision NOT NULL,
	"tvd_m" double precision,
	"tvd_from_survey" boolean DEFAULT false NOT NULL,
	"lithology" text,
	"upload_id" uuid
);
--> statement-breakpoint
CREATE TABLE "log_curves" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"well_id" uuid NOT NULL,
	"mnemonic" text NOT NULL,
	"unit" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"role" "curve_role" DEFAULT 'other' NOT NULL,
	"md_m" double precision[] NOT NULL,
	"values" double precision[] NOT NULL,
	"top_md_m" double precision NOT NULL,
	"base_md_m" double precision NOT NULL,
	"las_header" jsonb,
	"upload_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pressure_observations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"well_id" uuid NOT NULL,
	"kind" "pressure_kind" NOT NULL,
	"md_m" double precision NOT NULL,
	"tvd_m" double precision NOT NULL,
	"tvd_from_survey" boolean DEFAULT false NOT NULL,
	"value_entered" double precision NOT NULL,
	"unit_entered" text NOT NULL,
	"pressure_pa" double precision NOT NULL,
	"emw_kg_m_3" double precision NOT NULL,
	"quality" "pressure_quality" DEFAULT 'unknown' NOT NULL,
	"fluid" text,
	"observed_on" date,
	"source" text,
	"upload_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "survey_stations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"well_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"md_m" double precision NOT NULL,
	"inc_deg" double precision NOT NULL,
	"azi_deg" double precision NOT NULL,
	"tvd_m" double precision NOT NULL,
	"north_m" double precision NOT NULL,
	"east_m" double precision NOT NULL,
	"dogleg_deg_per30m" double precision NOT NULL,
	"upload_id" uuid
);
--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wells" ADD CONSTRAINT "wells_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wells" ADD CONSTRAINT "wells_created_upload_id_uploads_id_fk" FOREIGN KEY ("created_upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wells" ADD CONSTRAINT "wells_updated_upload_id_uploads_id_fk" FOREIGN KEY ("updated_upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wells" ADD CONSTRAINT "wells_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wells" ADD CONSTRAINT "wells_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "formation_tops" ADD CONSTRAINT "formation_tops_well_id_wells_id_fk" FOREIGN KEY ("well_id") REFERENCES "public"."wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "formation_tops" ADD CONSTRAINT "formation_tops_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_curves" ADD CONSTRAINT "log_curves_well_id_wells_id_fk" FOREIGN KEY ("well_id") REFERENCES "public"."wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_curves" ADD CONSTRAINT "log_curves_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pressure_observations" ADD CONSTRAINT "pressure_observations_well_id_wells_id_fk" FOREIGN KEY ("well_id") REFERENCES "public"."wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pressure_observations" ADD CONSTRAINT "pressure_observations_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "survey_stations" ADD CONSTRAINT "survey_stations_well_id_wells_id_fk" FOREIGN KEY ("well_id") REFERENCES "public"."wells"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "survey_stations" ADD CONSTRAINT "survey_stations_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "uploads_team_id_created_at_index" ON "uploads" USING btree ("team_id","created_at");--> statement-breakpoint
CREATE INDEX "uploads_team_id_sha256_index" ON "uploads" USING btree ("team_id","sha256");--> statement-breakpoint
CREATE INDEX "wells_location_gist" ON "wells" USING gist ("location");--> statement-breakpoint
CREATE INDEX "wells_team_id_name_index" ON "wells" USING btree ("team_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "wells_team_uwi_unique" ON "wells" USING btree ("team_id","uwi") WHERE "wells"."uwi" IS NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX "wells_team_name_unique" ON "wells" USING btree ("team_id","name");--> statement-breakpoint
CREATE INDEX "formation_tops_well_id_md_m_index" ON "formation_tops" USING btree ("well_id","md_m");--> statement-breakpoint
CREATE INDEX "log_curves_well_id_index" ON "log_curves" USING btree ("well_id");--> statement-breakpoint
CREATE INDEX "pressure_observations_well_id_tvd_m_index" ON "pressure_observations" USING btree ("well_id","tvd_m");--> statement-breakpoint
CREATE INDEX "pressure_observations_kind_index" ON "pressure_observations" USING btree ("kind");--> statement-breakpoint
CREATE INDEX "survey_stations_well_id_seq_index" ON "survey_stations" USING btree ("well_id","seq");