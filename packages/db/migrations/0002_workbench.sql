CREATE TYPE "public"."caution_kind" AS ENUM('hotBath', 'acid', 'powder', 'none');--> statement-breakpoint
CREATE TYPE "public"."dye_kind" AS ENUM('liquidFoodColor', 'gelFoodColor', 'acidDyePowder', 'other');--> statement-breakpoint
CREATE TYPE "public"."image_purpose" AS ENUM('inspiration', 'colorwayPhoto');--> statement-breakpoint
CREATE TYPE "public"."pot_material" AS ENUM('stainlessSteel', 'enamel', 'aluminum', 'other');--> statement-breakpoint
CREATE TYPE "public"."colorway_technique" AS ENUM('immersion', 'dipGradient', 'speckle', 'layeredPour', 'leftovers');--> statement-breakpoint
CREATE TABLE "bases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"name" varchar(80) NOT NULL,
	"fiber_content" jsonb NOT NULL,
	"superwash" boolean NOT NULL,
	"weight_class" integer NOT NULL,
	"skein_weight_g" double precision NOT NULL,
	"skein_length_m" double precision NOT NULL,
	"lot" varchar(40) DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "bases_weight_class_range" CHECK ("bases"."weight_class" between 0 and 7)
);
--> statement-breakpoint
CREATE TABLE "colorways" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"name" varchar(80) NOT NULL,
	"technique" "colorway_technique" NOT NULL,
	"base_id" uuid,
	"pot_id" uuid,
	"skein_count" integer DEFAULT 1 NOT NULL,
	"weight_of_goods_g" double precision NOT NULL,
	"liquor_ratio" double precision NOT NULL,
	"acid" jsonb NOT NULL,
	"recipe_lines" jsonb NOT NULL,
	"target_swatches" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "dyes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"kind" "dye_kind" NOT NULL,
	"name" varchar(80) NOT NULL,
	"colorant_ids" text[] DEFAULT '{}'::text[] NOT NULL,
	"swatch_hex" varchar(7) NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "images" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"purpose" "image_purpose" NOT NULL,
	"colorway_id" uuid,
	"web_key" text NOT NULL,
	"thumb_key" text NOT NULL,
	"content_type" varchar(40) NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"bytes" integer NOT NULL,
	"thumb_width" integer NOT NULL,
	"thumb_height" integer NOT NULL,
	"palette" jsonb NOT NULL,
	"uploaded_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "images_web_key_unique" UNIQUE("web_key"),
	CONSTRAINT "images_thumb_key_unique" UNIQUE("thumb_key")
);
--> statement-breakpoint
CREATE TABLE "pots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"name" varchar(80) NOT NULL,
	"capacity_ml" double precision NOT NULL,
	"material" "pot_material" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "run_sheet_steps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"colorway_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"instruction" text NOT NULL,
	"recipe_line_id" uuid,
	"timer_seconds" integer,
	"temperature_c" double precision,
	"visual_cue" text,
	"caution" "caution_kind" DEFAULT 'none' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stock_adjustments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"stock_solution_id" uuid NOT NULL,
	"volume_left_before_ml" double precision NOT NULL,
	"volume_left_after_ml" double precision NOT NULL,
	"reason" varchar(200) NOT NULL,
	"adjusted_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stock_solutions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"dye_id" uuid NOT NULL,
	"stock_strength_pct" double precision NOT NULL,
	"volume_made_ml" double precision NOT NULL,
	"made_on" date NOT NULL,
	"volume_left_ml" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_strength_range" CHECK ("stock_solutions"."stock_strength_pct" > 0 and "stock_solutions"."stock_strength_pct" <= 100),
	CONSTRAINT "stock_volume_left_range" CHECK ("stock_solutions"."volume_left_ml" >= 0)
);
--> statement-breakpoint
ALTER TABLE "bases" ADD CONSTRAINT "bases_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "colorways" ADD CONSTRAINT "colorways_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "colorways" ADD CONSTRAINT "colorways_base_id_bases_id_fk" FOREIGN KEY ("base_id") REFERENCES "public"."bases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "colorways" ADD CONSTRAINT "colorways_pot_id_pots_id_fk" FOREIGN KEY ("pot_id") REFERENCES "public"."pots"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dyes" ADD CONSTRAINT "dyes_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "images" ADD CONSTRAINT "images_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "images" ADD CONSTRAINT "images_colorway_id_colorways_id_fk" FOREIGN KEY ("colorway_id") REFERENCES "public"."colorways"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "images" ADD CONSTRAINT "images_uploaded_by_user_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pots" ADD CONSTRAINT "pots_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "run_sheet_steps" ADD CONSTRAINT "run_sheet_steps_colorway_id_colorways_id_fk" FOREIGN KEY ("colorway_id") REFERENCES "public"."colorways"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_adjustments" ADD CONSTRAINT "stock_adjustments_stock_solution_id_stock_solutions_id_fk" FOREIGN KEY ("stock_solution_id") REFERENCES "public"."stock_solutions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_adjustments" ADD CONSTRAINT "stock_adjustments_adjusted_by_user_id_fk" FOREIGN KEY ("adjusted_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_solutions" ADD CONSTRAINT "stock_solutions_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_solutions" ADD CONSTRAINT "stock_solutions_dye_id_dyes_id_fk" FOREIGN KEY ("dye_id") REFERENCES "public"."dyes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "bases_studio_idx" ON "bases" USING btree ("studio_id","name");--> statement-breakpoint
CREATE INDEX "colorways_studio_idx" ON "colorways" USING btree ("studio_id","updated_at");--> statement-breakpoint
CREATE INDEX "dyes_studio_idx" ON "dyes" USING btree ("studio_id","name");--> statement-breakpoint
CREATE INDEX "images_studio_idx" ON "images" USING btree ("studio_id","created_at");--> statement-breakpoint
CREATE INDEX "pots_studio_idx" ON "pots" USING btree ("studio_id","name");--> statement-breakpoint
CREATE INDEX "run_sheet_steps_colorway_idx" ON "run_sheet_steps" USING btree ("colorway_id","position");--> statement-breakpoint
CREATE INDEX "stock_adjustments_stock_idx" ON "stock_adjustments" USING btree ("stock_solution_id","created_at");--> statement-breakpoint
CREATE INDEX "stock_solutions_studio_idx" ON "stock_solutions" USING btree ("studio_id","made_on");