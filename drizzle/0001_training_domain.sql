CREATE TYPE "public"."measure" AS ENUM('hold_seconds', 'reps', 'eccentric_seconds', 'distance_m', 'hold_seconds_each_side', 'reps_each_side');--> statement-breakpoint
CREATE TYPE "public"."position_status" AS ENUM('not_yet', 'met', 'blocked', 'step_down', 'pending_approval', 'achieved');--> statement-breakpoint
CREATE TYPE "public"."promotion_mode" AS ENUM('auto', 'approve');--> statement-breakpoint
CREATE TYPE "public"."move_cause" AS ENUM('placement', 'auto', 'approved', 'manual', 'step_down');--> statement-breakpoint
CREATE TYPE "public"."move_direction" AS ENUM('up', 'down');--> statement-breakpoint
CREATE TYPE "public"."promotion_status" AS ENUM('pending', 'approved', 'declined', 'auto');--> statement-breakpoint
CREATE TABLE "athlete_positions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"ladder_id" uuid NOT NULL,
	"rung_id" uuid NOT NULL,
	"since" date NOT NULL,
	"readiness" integer DEFAULT 0 NOT NULL,
	"status" "position_status" DEFAULT 'not_yet' NOT NULL,
	"last_session_on" date,
	"last_pain_on" date,
	"sessions_met" integer DEFAULT 0 NOT NULL,
	"achieved_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "athlete_positions_readiness" CHECK ("athlete_positions"."readiness" between 0 and 100)
);
--> statement-breakpoint
CREATE TABLE "ladders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"target_skill" text NOT NULL,
	"notes" text,
	"promotion_mode" "promotion_mode" DEFAULT 'auto' NOT NULL,
	"starter_key" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rung_prerequisites" (
	"team_id" uuid NOT NULL,
	"rung_id" uuid NOT NULL,
	"requires_rung_id" uuid NOT NULL,
	CONSTRAINT "rung_prerequisites_rung_id_requires_rung_id_pk" PRIMARY KEY("rung_id","requires_rung_id"),
	CONSTRAINT "rung_prerequisites_not_self" CHECK ("rung_prerequisites"."rung_id" <> "rung_prerequisites"."requires_rung_id")
);
--> statement-breakpoint
CREATE TABLE "rungs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"ladder_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"name" text NOT NULL,
	"measure" "measure" NOT NULL,
	"setting" text,
	"cues" text,
	"caution" text,
	"demo_video_url" text,
	"tags" text[] DEFAULT '{}'::text[] NOT NULL,
	"starter_key" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "rungs_ladder_position_key" UNIQUE("ladder_id","position") DEFERRABLE INITIALLY DEFERRED,
	CONSTRAINT "rungs_archived_position" CHECK (("rungs"."archived_at" is null) = ("rungs"."position" > 0))
);
--> statement-breakpoint
CREATE TABLE "standards" (
	"rung_id" uuid PRIMARY KEY NOT NULL,
	"team_id" uuid NOT NULL,
	"sets" integer NOT NULL,
	"min_value" double precision NOT NULL,
	"min_reps" integer,
	"max_rpe" double precision,
	"min_rir" integer,
	"sessions_required" integer NOT NULL,
	"sessions_window" integer NOT NULL,
	"min_days_on_rung" integer NOT NULL,
	"pain_free" boolean DEFAULT true NOT NULL,
	"step_down" jsonb,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "standards_sets" CHECK ("standards"."sets" between 1 and 20),
	CONSTRAINT "standards_min_value" CHECK ("standards"."min_value" > 0 and "standards"."min_value" <= 3600),
	CONSTRAINT "standards_min_reps" CHECK ("standards"."min_reps" is null or "standards"."min_reps" between 1 and 100),
	CONSTRAINT "standards_effort" CHECK (not ("standards"."max_rpe" is not null and "standards"."min_rir" is not null)),
	CONSTRAINT "standards_max_rpe" CHECK ("standards"."max_rpe" is null or "standards"."max_rpe" between 1 and 10),
	CONSTRAINT "standards_min_rir" CHECK ("standards"."min_rir" is null or "standards"."min_rir" between 0 and 10),
	CONSTRAINT "standards_window" CHECK ("standards"."sessions_required" between 1 and "standards"."sessions_window" and "standards"."sessions_window" <= 20),
	CONSTRAINT "standards_days" CHECK ("standards"."min_days_on_rung" between 0 and 365)
);
--> statement-breakpoint
CREATE TABLE "assignments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"plan_id" uuid NOT NULL,
	"squad_id" uuid,
	"starts_on" date NOT NULL,
	"ends_on" date,
	"created_by_id" uuid,
	"cancelled_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "assignments_dates" CHECK ("assignments"."ends_on" is null or "assignments"."ends_on" >= "assignments"."starts_on")
);
--> statement-breakpoint
CREATE TABLE "block_slots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"block_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"ladder_id" uuid NOT NULL,
	"sets" integer,
	"target" text,
	"note" text,
	CONSTRAINT "block_slots_sets" CHECK ("block_slots"."sets" is null or "block_slots"."sets" between 1 and 20)
);
--> statement-breakpoint
CREATE TABLE "blocks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"rounds" integer NOT NULL,
	"rest_between_slots_sec" integer NOT NULL,
	"rest_between_rounds_sec" integer NOT NULL,
	"notes" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "blocks_rounds" CHECK ("blocks"."rounds" between 1 and 20),
	CONSTRAINT "blocks_rests" CHECK ("blocks"."rest_between_slots_sec" between 0 and 900 and "blocks"."rest_between_rounds_sec" between 0 and 1800)
);
--> statement-breakpoint
CREATE TABLE "plan_day_blocks" (
	"team_id" uuid NOT NULL,
	"plan_id" uuid NOT NULL,
	"weekday" integer NOT NULL,
	"position" integer NOT NULL,
	"block_id" uuid NOT NULL,
	CONSTRAINT "plan_day_blocks_plan_id_weekday_position_pk" PRIMARY KEY("plan_id","weekday","position"),
	CONSTRAINT "plan_day_blocks_weekday" CHECK ("plan_day_blocks"."weekday" between 1 and 7)
);
--> statement-breakpoint
CREATE TABLE "plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"weeks" integer NOT NULL,
	"warm_up" text,
	"cool_down" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "plans_weeks" CHECK ("plans"."weeks" between 1 and 104)
);
--> statement-breakpoint
CREATE TABLE "squad_members" (
	"team_id" uuid NOT NULL,
	"squad_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	CONSTRAINT "squad_members_squad_id_athlete_id_pk" PRIMARY KEY("squad_id","athlete_id")
);
--> statement-breakpoint
CREATE TABLE "squads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"description" text,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "log_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"log_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"ladder_id" uuid NOT NULL,
	"rung_id" uuid NOT NULL,
	"performed_on" date NOT NULL,
	"sets" jsonb NOT NULL,
	"best_value" double precision,
	"pain" boolean DEFAULT false NOT NULL,
	"note" text,
	"deleted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "logs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"performed_on" date NOT NULL,
	"duration_minutes" integer,
	"session_rpe" double precision,
	"entered_by_id" uuid,
	"deleted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "logs_duration" CHECK ("logs"."duration_minutes" is null or "logs"."duration_minutes" between 1 and 600),
	CONSTRAINT "logs_session_rpe" CHECK ("logs"."session_rpe" is null or "logs"."session_rpe" between 1 and 10)
);
--> statement-breakpoint
CREATE TABLE "position_moves" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"ladder_id" uuid NOT NULL,
	"from_rung_id" uuid,
	"to_rung_id" uuid,
	"cause" "move_cause" NOT NULL,
	"actor_user_id" uuid,
	"actor_kind" text DEFAULT 'user' NOT NULL,
	"promotion_id" uuid,
	"verdict" jsonb,
	"effective_on" date NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "promotions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"athlete_id" uuid NOT NULL,
	"ladder_id" uuid NOT NULL,
	"position_id" uuid NOT NULL,
	"from_rung_id" uuid NOT NULL,
	"to_rung_id" uuid,
	"direction" "move_direction" DEFAULT 'up' NOT NULL,
	"status" "promotion_status" NOT NULL,
	"verdict" jsonb NOT NULL,
	"log_id" uuid,
	"effective_on" date NOT NULL,
	"decided_by_id" uuid,
	"decided_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "athlete_positions" ADD CONSTRAINT "athlete_positions_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "athlete_positions" ADD CONSTRAINT "athlete_positions_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "athlete_positions" ADD CONSTRAINT "athlete_positions_ladder_id_ladders_id_fk" FOREIGN KEY ("ladder_id") REFERENCES "public"."ladders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "athlete_positions" ADD CONSTRAINT "athlete_positions_rung_id_rungs_id_fk" FOREIGN KEY ("rung_id") REFERENCES "public"."rungs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ladders" ADD CONSTRAINT "ladders_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rung_prerequisites" ADD CONSTRAINT "rung_prerequisites_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rung_prerequisites" ADD CONSTRAINT "rung_prerequisites_rung_id_rungs_id_fk" FOREIGN KEY ("rung_id") REFERENCES "public"."rungs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rung_prerequisites" ADD CONSTRAINT "rung_prerequisites_requires_rung_id_rungs_id_fk" FOREIGN KEY ("requires_rung_id") REFERENCES "public"."rungs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rungs" ADD CONSTRAINT "rungs_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rungs" ADD CONSTRAINT "rungs_ladder_id_ladders_id_fk" FOREIGN KEY ("ladder_id") REFERENCES "public"."ladders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "standards" ADD CONSTRAINT "standards_rung_id_rungs_id_fk" FOREIGN KEY ("rung_id") REFERENCES "public"."rungs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "standards" ADD CONSTRAINT "standards_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assignments" ADD CONSTRAINT "assignments_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assignments" ADD CONSTRAINT "assignments_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assignments" ADD CONSTRAINT "assignments_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assignments" ADD CONSTRAINT "assignments_squad_id_squads_id_fk" FOREIGN KEY ("squad_id") REFERENCES "public"."squads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assignments" ADD CONSTRAINT "assignments_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "block_slots" ADD CONSTRAINT "block_slots_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "block_slots" ADD CONSTRAINT "block_slots_block_id_blocks_id_fk" FOREIGN KEY ("block_id") REFERENCES "public"."blocks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "block_slots" ADD CONSTRAINT "block_slots_ladder_id_ladders_id_fk" FOREIGN KEY ("ladder_id") REFERENCES "public"."ladders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "blocks" ADD CONSTRAINT "blocks_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_day_blocks" ADD CONSTRAINT "plan_day_blocks_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_day_blocks" ADD CONSTRAINT "plan_day_blocks_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_day_blocks" ADD CONSTRAINT "plan_day_blocks_block_id_blocks_id_fk" FOREIGN KEY ("block_id") REFERENCES "public"."blocks"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "squad_members" ADD CONSTRAINT "squad_members_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "squad_members" ADD CONSTRAINT "squad_members_squad_id_squads_id_fk" FOREIGN KEY ("squad_id") REFERENCES "public"."squads"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "squad_members" ADD CONSTRAINT "squad_members_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "squads" ADD CONSTRAINT "squads_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_entries" ADD CONSTRAINT "log_entries_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_entries" ADD CONSTRAINT "log_entries_log_id_logs_id_fk" FOREIGN KEY ("log_id") REFERENCES "public"."logs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_entries" ADD CONSTRAINT "log_entries_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_entries" ADD CONSTRAINT "log_entries_ladder_id_ladders_id_fk" FOREIGN KEY ("ladder_id") REFERENCES "public"."ladders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "log_entries" ADD CONSTRAINT "log_entries_rung_id_rungs_id_fk" FOREIGN KEY ("rung_id") REFERENCES "public"."rungs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_entered_by_id_users_id_fk" FOREIGN KEY ("entered_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_ladder_id_ladders_id_fk" FOREIGN KEY ("ladder_id") REFERENCES "public"."ladders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_from_rung_id_rungs_id_fk" FOREIGN KEY ("from_rung_id") REFERENCES "public"."rungs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_to_rung_id_rungs_id_fk" FOREIGN KEY ("to_rung_id") REFERENCES "public"."rungs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_actor_user_id_users_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "position_moves" ADD CONSTRAINT "position_moves_promotion_id_promotions_id_fk" FOREIGN KEY ("promotion_id") REFERENCES "public"."promotions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_athlete_id_athletes_id_fk" FOREIGN KEY ("athlete_id") REFERENCES "public"."athletes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_ladder_id_ladders_id_fk" FOREIGN KEY ("ladder_id") REFERENCES "public"."ladders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_position_id_athlete_positions_id_fk" FOREIGN KEY ("position_id") REFERENCES "public"."athlete_positions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_from_rung_id_rungs_id_fk" FOREIGN KEY ("from_rung_id") REFERENCES "public"."rungs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_to_rung_id_rungs_id_fk" FOREIGN KEY ("to_rung_id") REFERENCES "public"."rungs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_log_id_logs_id_fk" FOREIGN KEY ("log_id") REFERENCES "public"."logs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "promotions" ADD CONSTRAINT "promotions_decided_by_id_users_id_fk" FOREIGN KEY ("decided_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "athlete_positions_athlete_ladder_key" ON "athlete_positions" USING btree ("athlete_id","ladder_id");--> statement-breakpoint
CREATE INDEX "athlete_positions_team_status_idx" ON "athlete_positions" USING btree ("team_id","status");--> statement-breakpoint
CREATE INDEX "athlete_positions_team_readiness_idx" ON "athlete_positions" USING btree ("team_id","readiness");--> statement-breakpoint
CREATE INDEX "athlete_positions_rung_idx" ON "athlete_positions" USING btree ("rung_id");--> statement-breakpoint
CREATE INDEX "ladders_team_name_idx" ON "ladders" USING btree ("team_id","name");--> statement-breakpoint
CREATE INDEX "rungs_team_idx" ON "rungs" USING btree ("team_id");--> statement-breakpoint
CREATE INDEX "assignments_athlete_idx" ON "assignments" USING btree ("athlete_id","starts_on");--> statement-breakpoint
CREATE UNIQUE INDEX "block_slots_block_position_key" ON "block_slots" USING btree ("block_id","position");--> statement-breakpoint
CREATE INDEX "blocks_team_idx" ON "blocks" USING btree ("team_id","name");--> statement-breakpoint
CREATE INDEX "plans_team_idx" ON "plans" USING btree ("team_id","name");--> statement-breakpoint
CREATE INDEX "squad_members_athlete_idx" ON "squad_members" USING btree ("athlete_id");--> statement-breakpoint
CREATE INDEX "squads_team_idx" ON "squads" USING btree ("team_id","name");--> statement-breakpoint
CREATE INDEX "log_entries_athlete_rung_date_idx" ON "log_entries" USING btree ("athlete_id","rung_id","performed_on");--> statement-breakpoint
CREATE INDEX "log_entries_team_date_idx" ON "log_entries" USING btree ("team_id","performed_on","athlete_id","ladder_id");--> statement-breakpoint
CREATE INDEX "log_entries_log_idx" ON "log_entries" USING btree ("log_id");--> statement-breakpoint
CREATE INDEX "logs_athlete_date_idx" ON "logs" USING btree ("athlete_id","performed_on");--> statement-breakpoint
CREATE INDEX "logs_team_date_idx" ON "logs" USING btree ("team_id","performed_on");--> statement-breakpoint
CREATE INDEX "position_moves_athlete_ladder_idx" ON "position_moves" USING btree ("athlete_id","ladder_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "promotions_one_pending_key" ON "promotions" USING btree ("position_id") WHERE "promotions"."status" = 'pending';--> statement-breakpoint
CREATE INDEX "promotions_team_status_idx" ON "promotions" USING btree ("team_id","status","created_at");--> statement-breakpoint
CREATE INDEX "promotions_athlete_idx" ON "promotions" USING btree ("athlete_id","created_at");