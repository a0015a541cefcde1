CREATE TABLE "daily_evaluations" (
	"team_id" uuid NOT NULL,
	"local_date" date NOT NULL,
	"result" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mail_deliveries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dedupe_key" text NOT NULL,
	"team_id" uuid,
	"recipient" text NOT NULL,
	"kind" text NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"job" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notification_preferences" (
	"email" text PRIMARY KEY NOT NULL,
	"team_id" uuid NOT NULL,
	"promotion_notices" boolean DEFAULT true NOT NULL,
	"approval_notices" boolean DEFAULT true NOT NULL,
	"weekly_digest" boolean DEFAULT true NOT NULL,
	"digest_weekday" smallint DEFAULT 1 NOT NULL,
	"digest_hour" smallint DEFAULT 7 NOT NULL,
	"athlete_summary" boolean DEFAULT true NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "notification_preferences_weekday" CHECK ("notification_preferences"."digest_weekday" between 1 and 7),
	CONSTRAINT "notification_preferences_hour" CHECK ("notification_preferences"."digest_hour" between 0 and 23),
	CONSTRAINT "notification_preferences_email_normalised" CHECK ("notification_preferences"."email" = lower(trim("notification_preferences"."email")))
);
--> statement-breakpoint
CREATE TABLE "used_mail_links" (
	"nonce" text PRIMARY KEY NOT NULL,
	"used_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "daily_evaluations" ADD CONSTRAINT "daily_evaluations_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_deliveries" ADD CONSTRAINT "mail_deliveries_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notification_preferences" ADD CONSTRAINT "notification_preferences_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "daily_evaluations_team_date_key" ON "daily_evaluations" USING btree ("team_id","local_date");--> statement-breakpoint
CREATE UNIQUE INDEX "mail_deliveries_dedupe_key" ON "mail_deliveries" USING btree ("dedupe_key");--> statement-breakpoint
CREATE INDEX "mail_deliveries_team_idx" ON "mail_deliveries" USING btree ("team_id","sent_at");--> statement-breakpoint
CREATE INDEX "notification_preferences_team_idx" ON "notification_preferences" USING btree ("team_id");--> statement-breakpoint
CREATE INDEX "log_entries_athlete_ladder_date_idx" ON "log_entries" USING btree ("athlete_id","ladder_id","performed_on");