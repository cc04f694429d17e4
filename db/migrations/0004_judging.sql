CREATE TYPE "public"."judging_method" AS ENUM('points', 'sort_then_points', 'sort_then_rank', 'rank');--> statement-breakpoint
CREATE TYPE "public"."panel_role" AS ENUM('judge', 'scribe');--> statement-breakpoint
CREATE TYPE "public"."sheet_status" AS ENUM('open', 'submitted');--> statement-breakpoint
CREATE TABLE "judge_declarations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"judge_user_id" text NOT NULL,
	"person_name" text DEFAULT '' NOT NULL,
	"person_email" text DEFAULT '' NOT NULL,
	"relation" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "judge_sheets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"judge_user_id" text NOT NULL,
	"score_sheet_id" uuid,
	"status" "sheet_status" DEFAULT 'open' NOT NULL,
	"version" integer DEFAULT 0 NOT NULL,
	"state" jsonb NOT NULL,
	"total" jsonb,
	"submitted_at" timestamp with time zone,
	"reopened_at" timestamp with time zone,
	"reopen_reason" text DEFAULT '' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "judging_panels" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"name" text NOT NULL,
	"day" text DEFAULT '' NOT NULL,
	"room" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "panel_categories" (
	"panel_id" uuid NOT NULL,
	"category_id" uuid NOT NULL,
	CONSTRAINT "panel_categories_panel_id_category_id_pk" PRIMARY KEY("panel_id","category_id")
);
--> statement-breakpoint
CREATE TABLE "panel_members" (
	"panel_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"role" "panel_role" NOT NULL,
	CONSTRAINT "panel_members_panel_id_user_id_pk" PRIMARY KEY("panel_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "score_changes" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"show_id" uuid NOT NULL,
	"sheet_id" uuid NOT NULL,
	"change_key" text NOT NULL,
	"device_id" text NOT NULL,
	"seq" integer NOT NULL,
	"kind" text NOT NULL,
	"field" text,
	"value" jsonb,
	"base_version" integer,
	"entered_by" text NOT NULL,
	"for_judge" text NOT NULL,
	"client_at" timestamp with time zone,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"outcome" jsonb NOT NULL,
	CONSTRAINT "score_changes_changeKey_unique" UNIQUE("change_key")
);
--> statement-breakpoint
CREATE TABLE "score_sheets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"name" text NOT NULL,
	"sheet" jsonb NOT NULL,
	"is_default" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "comment_policy" text DEFAULT 'all' NOT NULL;--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "quick_phrases" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "judge_fields" text[] DEFAULT '{title,size,techniques,quiltingMethod,pattern}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "categories" ADD COLUMN "score_sheet_id" uuid;--> statement-breakpoint
ALTER TABLE "categories" ADD COLUMN "judging_method" "judging_method" DEFAULT 'points' NOT NULL;--> statement-breakpoint
ALTER TABLE "judge_declarations" ADD CONSTRAINT "judge_declarations_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_declarations" ADD CONSTRAINT "judge_declarations_judge_user_id_user_id_fk" FOREIGN KEY ("judge_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_sheets" ADD CONSTRAINT "judge_sheets_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_sheets" ADD CONSTRAINT "judge_sheets_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_sheets" ADD CONSTRAINT "judge_sheets_judge_user_id_user_id_fk" FOREIGN KEY ("judge_user_id") REFERENCES "public"."user"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_sheets" ADD CONSTRAINT "judge_sheets_score_sheet_id_score_sheets_id_fk" FOREIGN KEY ("score_sheet_id") REFERENCES "public"."score_sheets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judging_panels" ADD CONSTRAINT "judging_panels_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "panel_categories" ADD CONSTRAINT "panel_categories_panel_id_judging_panels_id_fk" FOREIGN KEY ("panel_id") REFERENCES "public"."judging_panels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "panel_members" ADD CONSTRAINT "panel_members_panel_id_judging_panels_id_fk" FOREIGN KEY ("panel_id") REFERENCES "public"."judging_panels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "panel_members" ADD CONSTRAINT "panel_members_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "score_changes" ADD CONSTRAINT "score_changes_sheet_id_judge_sheets_id_fk" FOREIGN KEY ("sheet_id") REFERENCES "public"."judge_sheets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "score_sheets" ADD CONSTRAINT "score_sheets_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "judge_declarations_show_judge" ON "judge_declarations" USING btree ("show_id","judge_user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "judge_sheets_entry_judge" ON "judge_sheets" USING btree ("entry_id","judge_user_id");--> statement-breakpoint
CREATE INDEX "judge_sheets_show_judge" ON "judge_sheets" USING btree ("show_id","judge_user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "judging_panels_show_name" ON "judging_panels" USING btree ("show_id","name");--> statement-breakpoint
CREATE INDEX "panel_categories_category" ON "panel_categories" USING btree ("category_id");--> statement-breakpoint
CREATE INDEX "panel_members_user" ON "panel_members" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "score_changes_sheet" ON "score_changes" USING btree ("sheet_id","id");--> statement-breakpoint
CREATE UNIQUE INDEX "score_sheets_show_name" ON "score_sheets" USING btree ("show_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "score_sheets_one_default" ON "score_sheets" USING btree ("show_id") WHERE "score_sheets"."is_default";--> statement-breakpoint
ALTER TABLE "categories" ADD CONSTRAINT "categories_score_sheet_id_score_sheets_id_fk" FOREIGN KEY ("score_sheet_id") REFERENCES "public"."score_sheets"("id") ON DELETE set null ON UPDATE no action;