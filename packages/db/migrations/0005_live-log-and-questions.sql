CREATE TYPE "public"."closeness_band" AS ENUM('veryClose', 'close', 'sameFamily', 'ownStory');--> statement-breakpoint
CREATE TYPE "public"."review_action" AS ENUM('approve', 'needsChanges', 'reject', 'feature', 'unfeature');--> statement-breakpoint
CREATE TYPE "public"."review_mail_kind" AS ENUM('approved', 'needsChanges', 'featured');--> statement-breakpoint
CREATE TYPE "public"."submission_status" AS ENUM('waiting', 'approved', 'featured', 'needsChanges', 'rejected');--> statement-breakpoint
CREATE TYPE "public"."dye_log_kind" AS ENUM('stock', 'foodColor');--> statement-breakpoint
CREATE TYPE "public"."dye_log_unit" AS ENUM('mL', 'drop', 'gGel');--> statement-breakpoint
CREATE TABLE "recap_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dye_along_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"submission_id" uuid,
	"colorway_id" uuid,
	"note" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "recap_items_one_subject" CHECK (num_nonnulls("recap_items"."submission_id", "recap_items"."colorway_id") = 1)
);
--> statement-breakpoint
CREATE TABLE "review_decisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"dye_along_id" uuid NOT NULL,
	"submission_id" uuid NOT NULL,
	"action" "review_action" NOT NULL,
	"from_status" "submission_status" NOT NULL,
	"to_status" "submission_status" NOT NULL,
	"reason" text,
	"actor_user_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "review_mail_opt_outs" (
	"studio_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "review_mail_opt_outs_studio_id_user_id_pk" PRIMARY KEY("studio_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "review_mail_outbox" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kind" "review_mail_kind" NOT NULL,
	"decision_id" uuid NOT NULL,
	"submission_id" uuid NOT NULL,
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
CREATE TABLE "submission_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"submission_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"web_key" text NOT NULL,
	"thumb_key" text NOT NULL,
	"content_type" varchar(40) NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"bytes" integer NOT NULL,
	"thumb_width" integer NOT NULL,
	"thumb_height" integer NOT NULL,
	"yarn_crop" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "submission_photos_web_key_unique" UNIQUE("web_key"),
	CONSTRAINT "submission_photos_thumb_key_unique" UNIQUE("thumb_key")
);
--> statement-breakpoint
CREATE TABLE "submissions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"studio_id" uuid NOT NULL,
	"dye_along_id" uuid NOT NULL,
	"sharer_user_id" text NOT NULL,
	"colorway_id" uuid,
	"base_name" varchar(120) NOT NULL,
	"fiber_content" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"dyes_used" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"consent_to_feature" boolean DEFAULT false NOT NULL,
	"status" "submission_status" DEFAULT 'waiting' NOT NULL,
	"reason" text,
	"waiting_since" timestamp with time zone DEFAULT now() NOT NULL,
	"yarn_palette" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"closeness_band" "closeness_band",
	"closeness_message" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "dye_log_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"session_id" uuid NOT NULL,
	"pot_id" uuid NOT NULL,
	"recipe_line_id" uuid NOT NULL,
	"kind" "dye_log_kind" NOT NULL,
	"name" varchar(80) NOT NULL,
	"amount" double precision NOT NULL,
	"unit" "dye_log_unit" NOT NULL,
	"planned_amount" double precision NOT NULL,
	"as_planned" boolean NOT NULL,
	"stock_solution_id" uuid,
	"jar_change_ml" double precision DEFAULT 0 NOT NULL,
	"added_at" timestamp with time zone NOT NULL,
	"note" varchar(200) DEFAULT '' NOT NULL,
	"supersedes_id" uuid,
	"reason" varchar(200) DEFAULT '' NOT NULL,
	"recorded_by" text,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "dye_log_amount_range" CHECK ("dye_log_entries"."amount" >= 0)
);
--> statement-breakpoint
CREATE TABLE "live_question_me_toos" (
	"question_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "live_question_me_toos_question_id_user_id_pk" PRIMARY KEY("question_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "live_questions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"session_id" uuid NOT NULL,
	"asked_by" text NOT NULL,
	"text" varchar(280) NOT NULL,
	"me_too_count" integer DEFAULT 0 NOT NULL,
	"asked_at" timestamp with time zone DEFAULT now() NOT NULL,
	"answer" varchar(280) DEFAULT '' NOT NULL,
	"answered_at" timestamp with time zone,
	"answered_by" text,
	"hidden_at" timestamp with time zone,
	"hidden_by" text
);
--> statement-breakpoint
CREATE TABLE "live_session_mutes" (
	"session_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"muted_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "live_session_mutes_session_id_user_id_pk" PRIMARY KEY("session_id","user_id")
);
--> statement-breakpoint
ALTER TABLE "recap_items" ADD CONSTRAINT "recap_items_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recap_items" ADD CONSTRAINT "recap_items_submission_id_submissions_id_fk" FOREIGN KEY ("submission_id") REFERENCES "public"."submissions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recap_items" ADD CONSTRAINT "recap_items_colorway_id_colorways_id_fk" FOREIGN KEY ("colorway_id") REFERENCES "public"."colorways"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_decisions" ADD CONSTRAINT "review_decisions_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_decisions" ADD CONSTRAINT "review_decisions_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_decisions" ADD CONSTRAINT "review_decisions_actor_user_id_user_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_mail_opt_outs" ADD CONSTRAINT "review_mail_opt_outs_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_mail_opt_outs" ADD CONSTRAINT "review_mail_opt_outs_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_mail_outbox" ADD CONSTRAINT "review_mail_outbox_decision_id_review_decisions_id_fk" FOREIGN KEY ("decision_id") REFERENCES "public"."review_decisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_mail_outbox" ADD CONSTRAINT "review_mail_outbox_submission_id_submissions_id_fk" FOREIGN KEY ("submission_id") REFERENCES "public"."submissions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_mail_outbox" ADD CONSTRAINT "review_mail_outbox_recipient_user_id_user_id_fk" FOREIGN KEY ("recipient_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submission_photos" ADD CONSTRAINT "submission_photos_submission_id_submissions_id_fk" FOREIGN KEY ("submission_id") REFERENCES "public"."submissions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submissions" ADD CONSTRAINT "submissions_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submissions" ADD CONSTRAINT "submissions_dye_along_id_dye_alongs_id_fk" FOREIGN KEY ("dye_along_id") REFERENCES "public"."dye_alongs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submissions" ADD CONSTRAINT "submissions_sharer_user_id_user_id_fk" FOREIGN KEY ("sharer_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submissions" ADD CONSTRAINT "submissions_colorway_id_colorways_id_fk" FOREIGN KEY ("colorway_id") REFERENCES "public"."colorways"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_log_entries" ADD CONSTRAINT "dye_log_entries_session_id_live_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."live_sessions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_log_entries" ADD CONSTRAINT "dye_log_entries_stock_solution_id_stock_solutions_id_fk" FOREIGN KEY ("stock_solution_id") REFERENCES "public"."stock_solutions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_log_entries" ADD CONSTRAINT "dye_log_entries_supersedes_id_dye_log_entries_id_fk" FOREIGN KEY ("supersedes_id") REFERENCES "public"."dye_log_entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dye_log_entries" ADD CONSTRAINT "dye_log_entries_recorded_by_user_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_question_me_toos" ADD CONSTRAINT "live_question_me_toos_question_id_live_questions_id_fk" FOREIGN KEY ("question_id") REFERENCES "public"."live_questions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_question_me_toos" ADD CONSTRAINT "live_question_me_toos_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_questions" ADD CONSTRAINT "live_questions_session_id_live_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."live_sessions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_questions" ADD CONSTRAINT "live_questions_asked_by_user_id_fk" FOREIGN KEY ("asked_by") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_questions" ADD CONSTRAINT "live_questions_answered_by_user_id_fk" FOREIGN KEY ("answered_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_questions" ADD CONSTRAINT "live_questions_hidden_by_user_id_fk" FOREIGN KEY ("hidden_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_session_mutes" ADD CONSTRAINT "live_session_mutes_session_id_live_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."live_sessions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_session_mutes" ADD CONSTRAINT "live_session_mutes_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "live_session_mutes" ADD CONSTRAINT "live_session_mutes_muted_by_user_id_fk" FOREIGN KEY ("muted_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recap_items_order_idx" ON "recap_items" USING btree ("dye_along_id","position");--> statement-breakpoint
CREATE UNIQUE INDEX "recap_items_submission_idx" ON "recap_items" USING btree ("dye_along_id","submission_id");--> statement-breakpoint
CREATE UNIQUE INDEX "recap_items_colorway_idx" ON "recap_items" USING btree ("dye_along_id","colorway_id");--> statement-breakpoint
CREATE INDEX "review_decisions_studio_idx" ON "review_decisions" USING btree ("studio_id","created_at");--> statement-breakpoint
CREATE INDEX "review_decisions_submission_idx" ON "review_decisions" USING btree ("submission_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "review_mail_outbox_decision_idx" ON "review_mail_outbox" USING btree ("decision_id");--> statement-breakpoint
CREATE INDEX "review_mail_outbox_due_idx" ON "review_mail_outbox" USING btree ("run_after") WHERE "review_mail_outbox"."sent_at" is null and "review_mail_outbox"."skipped_at" is null and "review_mail_outbox"."failed_at" is null;--> statement-breakpoint
CREATE INDEX "submission_photos_submission_idx" ON "submission_photos" USING btree ("submission_id","position");--> statement-breakpoint
CREATE INDEX "submissions_queue_idx" ON "submissions" USING btree ("studio_id","status","waiting_since");--> statement-breakpoint
CREATE INDEX "submissions_dye_along_idx" ON "submissions" USING btree ("dye_along_id","status","created_at");--> statement-breakpoint
CREATE INDEX "submissions_sharer_idx" ON "submissions" USING btree ("sharer_user_id","created_at");--> statement-breakpoint
CREATE INDEX "dye_log_entries_session_idx" ON "dye_log_entries" USING btree ("session_id","recorded_at");--> statement-breakpoint
CREATE UNIQUE INDEX "dye_log_entries_supersedes_idx" ON "dye_log_entries" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "live_questions_session_idx" ON "live_questions" USING btree ("session_id","asked_at");--> statement-breakpoint
CREATE INDEX "live_questions_asker_idx" ON "live_questions" USING btree ("session_id","asked_by","asked_at");