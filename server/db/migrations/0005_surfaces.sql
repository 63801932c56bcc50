CREATE TABLE "surfaces" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"prospect_id" uuid NOT NULL,
	"name" text NOT NULL,
	"quantity" text NOT NULL,
	"method" text NOT NULL,
	"params" jsonb NOT NULL,
	"nx" integer NOT NULL,
	"ny" integer NOT NULL,
	"cell_size_m" double precision NOT NULL,
	"projection" text NOT NULL,
	"x0" double precision NOT NULL,
	"y0" double precision NOT NULL,
	"values" double precision[] NOT NULL,
	"std_dev" double precision[],
	"extent" geometry(Polygon,4326) NOT NULL,
	"result" jsonb NOT NULL,
	"rmse_m" double precision,
	"well_count" integer NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "surfaces" ADD CONSTRAINT "surfaces_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surfaces" ADD CONSTRAINT "surfaces_prospect_id_prospects_id_fk" FOREIGN KEY ("prospect_id") REFERENCES "public"."prospects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surfaces" ADD CONSTRAINT "surfaces_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "surfaces_team_id_prospect_id_index" ON "surfaces" USING btree ("team_id","prospect_id");--> statement-breakpoint
CREATE INDEX "surfaces_extent_gist" ON "surfaces" USING gist ("extent");