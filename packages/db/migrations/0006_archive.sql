CREATE TABLE "archived_colorways" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"dye_along_id" uuid NOT NULL,
	"colorway_id" uuid,
	"fiber_weight_dyed_g" double precision,
	"bath_volume_ml" double precision,
	"temperature_reached_c" double precision,
	"time_at_temperature_min" integer,
	"bath_exhausted" boolean,
	"base_lot" varchar(40) DEFAULT '' NOT NULL,
	"dye_lots" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"photo_image_ids" uuid[] DEFAULT '{}'::uuid[] NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"recorded_by" text,
	"archived_at" timestamp with time zone,
	"snapshot" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "archived_colorways_snapshot_with_date" CHECK (("archived_colorways"."archived_at" is null) = ("archived_colorways"."snapshot" is null)),
	CONSTRAINT "archived_colorways_bath_ranges" CHECK (("archived_colorways"."bath_volume_ml" is null or "archived_colorways"."bath_volume_ml" > 0) and ("archived_colorways"."fiber_weight_dyed_g" is null or "archived_colorways"."fiber_weight_dyed_g" > 0) and ("archived_colorways"."time_at_temperature_min" is null or "archived_colorways"."time_at_temperature_min" >= 0))
);
--> statement-breakpoint
ALTER TABLE "archived_colorways" ADD CONSTRAINT "archived_colorways_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "archived_colorways" ADD CONSTRAINT "archived_colorways_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "archived_colorways" ADD CONSTRAINT "archived_colorways_colorway_id_colorways_id_fk" FOREIGN KEY ("colorway_id") REFERENCES "public"."colorways"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "archived_colorways" ADD CONSTRAINT "archived_colorways_recorded_by_user_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "archived_colorways_month_colorway_idx" ON "archived_colorways" USING btree ("dye_along_id","colorway_id");--> statement-breakpoint
CREATE INDEX "archived_colorways_studio_idx" ON "archived_colorways" USING btree ("studio_id","archived_at");