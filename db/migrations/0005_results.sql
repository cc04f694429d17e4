CREATE TYPE "public"."award_chooser" AS ENUM('chair', 'judges_vote');--> statement-breakpoint
CREATE TYPE "public"."award_kind" AS ENUM('best_of_show', 'best_hand_quilting', 'best_home_machine', 'best_frame_machine', 'judges_choice', 'sponsor', 'other');--> statement-breakpoint
CREATE TYPE "public"."award_pick_kind" AS ENUM('vote', 'choice');--> statement-breakpoint
CREATE TABLE "award_picks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"award_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"judge_user_id" text,
	"kind" "award_pick_kind" NOT NULL,
	"reason" text DEFAULT '' NOT NULL,
	"recorded_by" text,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "placement_overrides" (
	"entry_id" uuid PRIMARY KEY NOT NULL,
	"show_id" uuid NOT NULL,
	"category_id" uuid NOT NULL,
	"place" integer,
	"honorable_mention" boolean DEFAULT false NOT NULL,
	"reason" text NOT NULL,
	"decided_by" text,
	"decided_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "result_mails" (
	"publication_id" uuid NOT NULL,
	"entrant_user_id" text NOT NULL,
	"sent_at" timestamp with time zone,
	"error" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "result_mails_publication_id_entrant_user_id_pk" PRIMARY KEY("publication_id","entrant_user_id")
);
--> statement-breakpoint
CREATE TABLE "result_publications" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"snapshot" jsonb NOT NULL,
	"reason" text DEFAULT '' NOT NULL,
	"published_by" text,
	"published_at" timestamp with time zone DEFAULT now() NOT NULL,
	"unpublished_at" timestamp with time zone,
	"unpublished_by" text,
	"unpublish_reason" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "show_awards" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" "award_kind" NOT NULL,
	"sponsor" text DEFAULT '' NOT NULL,
	"eligibility" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"choose_by" "award_chooser" DEFAULT 'chair' NOT NULL,
	"ribbon" jsonb NOT NULL,
	"combines_with" uuid[] DEFAULT '{}'::uuid[] NOT NULL,
	"keeps_category_place" boolean DEFAULT true NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tie_orders" (
	"category_id" uuid PRIMARY KEY NOT NULL,
	"show_id" uuid NOT NULL,
	"entry_ids" uuid[] NOT NULL,
	"reason" text NOT NULL,
	"decided_by" text,
	"decided_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "result_rules" jsonb;--> statement-breakpoint
ALTER TABLE "award_picks" ADD CONSTRAINT "award_picks_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "award_picks" ADD CONSTRAINT "award_picks_award_id_show_awards_id_fk" FOREIGN KEY ("award_id") REFERENCES "public"."show_awards"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "award_picks" ADD CONSTRAINT "award_picks_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "award_picks" ADD CONSTRAINT "award_picks_judge_user_id_user_id_fk" FOREIGN KEY ("judge_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "award_picks" ADD CONSTRAINT "award_picks_recorded_by_user_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placement_overrides" ADD CONSTRAINT "placement_overrides_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placement_overrides" ADD CONSTRAINT "placement_overrides_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placement_overrides" ADD CONSTRAINT "placement_overrides_category_id_categories_id_fk" FOREIGN KEY ("category_id") REFERENCES "public"."categories"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placement_overrides" ADD CONSTRAINT "placement_overrides_decided_by_user_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "result_mails" ADD CONSTRAINT "result_mails_publication_id_result_publications_id_fk" FOREIGN KEY ("publication_id") REFERENCES "public"."result_publications"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "result_mails" ADD CONSTRAINT "result_mails_entrant_user_id_user_id_fk" FOREIGN KEY ("entrant_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "result_publications" ADD CONSTRAINT "result_publications_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "result_publications" ADD CONSTRAINT "result_publications_published_by_user_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "result_publications" ADD CONSTRAINT "result_publications_unpublished_by_user_id_fk" FOREIGN KEY ("unpublished_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_awards" ADD CONSTRAINT "show_awards_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tie_orders" ADD CONSTRAINT "tie_orders_category_id_categories_id_fk" FOREIGN KEY ("category_id") REFERENCES "public"."categories"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tie_orders" ADD CONSTRAINT "tie_orders_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tie_orders" ADD CONSTRAINT "tie_orders_decided_by_user_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "award_picks_one_per_judge" ON "award_picks" USING btree ("award_id",coalesce("judge_user_id", ''));--> statement-breakpoint
CREATE INDEX "award_picks_show" ON "award_picks" USING btree ("show_id");--> statement-breakpoint
CREATE INDEX "placement_overrides_show" ON "placement_overrides" USING btree ("show_id");--> statement-breakpoint
CREATE UNIQUE INDEX "result_publications_show_version" ON "result_publications" USING btree ("show_id","version");--> statement-breakpoint
CREATE UNIQUE INDEX "result_publications_one_current" ON "result_publications" USING btree ("show_id") WHERE "result_publications"."unpublished_at" is null;--> statement-breakpoint
CREATE UNIQUE INDEX "show_awards_show_name" ON "show_awards" USING btree ("show_id","name");