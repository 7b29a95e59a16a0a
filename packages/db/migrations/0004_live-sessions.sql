CREATE TYPE "public"."live_mode" AS ENUM('live', 'rehearsal');--> statement-breakpoint
CREATE TABLE "live_sessions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"dye_along_id" uuid NOT NULL,
	"mode" "live_mode" NOT NULL,
	"revision" integer DEFAULT 0 NOT NULL,
	"state" jsonb NOT NULL,
	"program" jsonb NOT NULL,
	"started_by" text,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"ended_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "live_sessions" ADD CONSTRAINT "live_sessions_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_sessions" ADD CONSTRAINT "live_sessions_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_sessions" ADD CONSTRAINT "live_sessions_started_by_user_id_fk" FOREIGN KEY ("started_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "live_sessions_studio_idx" ON "live_sessions" USING btree ("studio_id","started_at");--> statement-breakpoint
CREATE UNIQUE INDEX "live_sessions_one_running_idx" ON "live_sessions" USING btree ("dye_along_id") WHERE "live_sessions"."ended_at" is null and "live_sessions"."mode" = 'live';