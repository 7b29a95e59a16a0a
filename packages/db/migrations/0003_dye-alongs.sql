CREATE TYPE "public"."dye_along_status" AS ENUM('draft', 'announced', 'live', 'sharing', 'recap', 'archived');--> statement-breakpoint
CREATE TYPE "public"."mail_kind" AS ENUM('announcement', 'reminder');--> statement-breakpoint
CREATE TABLE "dye_along_colorways" (
	"dye_along_id" uuid NOT NULL,
	"colorway_id" uuid NOT NULL,
	"position" integer NOT NULL,
	CONSTRAINT "dye_along_colorways_dye_along_id_colorway_id_pk" PRIMARY KEY("dye_along_id","colorway_id")
);
--> statement-breakpoint
CREATE TABLE "dye_alongs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"title" varchar(120) NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"time_zone" varchar(64) NOT NULL,
	"expected_length_min" integer NOT NULL,
	"stream_url" text,
	"inspiration_image_id" uuid,
	"share_opens_at" timestamp with time zone,
	"share_closes_at" timestamp with time zone,
	"host_prep_items" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"status" "dye_along_status" DEFAULT 'draft' NOT NULL,
	"status_changed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"announced_at" timestamp with time zone,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "dye_alongs_length_range" CHECK ("dye_alongs"."expected_length_min" between 1 and 1440),
	CONSTRAINT "dye_alongs_share_window" CHECK ("dye_alongs"."share_closes_at" is null or "dye_alongs"."share_opens_at" is null or "dye_alongs"."share_closes_at" > "dye_alongs"."share_opens_at")
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kind" "mail_kind" NOT NULL,
	"dye_along_id" uuid NOT NULL,
	"recipient_user_id" text NOT NULL,
	"run_after" timestamp with time zone DEFAULT now() NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"message_id" text,
	"sent_at" timestamp with time zone,
	"skipped_at" timestamp with time zone,
	"skip_reason" varchar(20),
	"failed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "dye_along_colorways" ADD CONSTRAINT "dye_along_colorways_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_along_colorways" ADD CONSTRAINT "dye_along_colorways_colorway_id_colorways_id_fk" FOREIGN KEY ("colorway_id") REFERENCES "public"."colorways"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_alongs" ADD CONSTRAINT "dye_alongs_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_alongs" ADD CONSTRAINT "dye_alongs_inspiration_image_id_images_id_fk" FOREIGN KEY ("inspiration_image_id") REFERENCES "public"."images"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_alongs" ADD CONSTRAINT "dye_alongs_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_recipient_user_id_user_id_fk" FOREIGN KEY ("recipient_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "dye_along_colorways_colorway_idx" ON "dye_along_colorways" USING btree ("colorway_id");--> statement-breakpoint
CREATE INDEX "dye_alongs_studio_idx" ON "dye_alongs" USING btree ("studio_id","starts_at");--> statement-breakpoint
CREATE UNIQUE INDEX "mail_outbox_dedupe_idx" ON "mail_outbox" USING btree ("kind","dye_along_id","recipient_user_id");--> statement-breakpoint
CREATE INDEX "mail_outbox_due_idx" ON "mail_outbox" USING btree ("run_after") WHERE "mail_outbox"."sent_at" is null and "mail_outbox"."skipped_at" is null and "mail_outbox"."failed_at" is null;