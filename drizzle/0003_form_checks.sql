CREATE TYPE "public"."upload_state" AS ENUM('pending', 'complete', 'rejected');--> statement-breakpoint
CREATE TABLE "form_check_comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"form_check_id" uuid NOT NULL,
	"author_id" uuid,
	"at_seconds" double precision NOT NULL,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "form_check_comments_at" CHECK ("form_check_comments"."at_seconds" >= 0)
);
--> statement-breakpoint
CREATE TABLE "form_checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"upload_id" uuid NOT NULL,
	"rung_id" uuid,
	"log_id" uuid,
	"created_by_id" uuid,
	"note" text,
	"poster" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "storage_deletions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"key" text NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"uploader_id" uuid,
	"purpose" text NOT NULL,
	"content_type" text NOT NULL,
	"declared_size" bigint NOT NULL,
	"actual_size" bigint,
	"state" "upload_state" DEFAULT 'pending' NOT NULL,
	"file_name" text,
	"staging_key" text NOT NULL,
	"final_key" text,
	"reject_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"completed_at" timestamp with time zone,
	CONSTRAINT "uploads_declared_size" CHECK ("uploads"."declared_size" > 0)
);
--> statement-breakpoint
ALTER TABLE "form_check_comments" ADD CONSTRAINT "form_check_comments_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_check_comments" ADD CONSTRAINT "form_check_comments_form_check_id_form_checks_id_fk" FOREIGN KEY ("form_check_id") REFERENCES "public"."form_checks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_check_comments" ADD CONSTRAINT "form_check_comments_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_checks" ADD CONSTRAINT "form_checks_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_checks" ADD CONSTRAINT "form_checks_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_checks" ADD CONSTRAINT "form_checks_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_checks" ADD CONSTRAINT "form_checks_rung_id_rungs_id_fk" FOREIGN KEY ("rung_id") REFERENCES "public"."rungs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_checks" ADD CONSTRAINT "form_checks_log_id_logs_id_fk" FOREIGN KEY ("log_id") REFERENCES "public"."logs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "form_checks" ADD CONSTRAINT "form_checks_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploader_id_users_id_fk" FOREIGN KEY ("uploader_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "form_check_comments_check_idx" ON "form_check_comments" USING btree ("form_check_id","at_seconds");--> statement-breakpoint
CREATE UNIQUE INDEX "form_checks_upload_key" ON "form_checks" USING btree ("upload_id");--> statement-breakpoint
CREATE INDEX "form_checks_team_created_idx" ON "form_checks" USING btree ("team_id","created_at","id");--> statement-breakpoint
CREATE INDEX "form_checks_athlete_created_idx" ON "form_checks" USING btree ("athlete_id","created_at","id");--> statement-breakpoint
CREATE INDEX "storage_deletions_due_idx" ON "storage_deletions" USING btree ("next_attempt_at");--> statement-breakpoint
CREATE INDEX "uploads_athlete_state_idx" ON "uploads" USING btree ("athlete_id","state");--> statement-breakpoint
CREATE INDEX "uploads_team_idx" ON "uploads" USING btree ("team_id");