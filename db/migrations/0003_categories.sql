CREATE TYPE "public"."category_state" AS ENUM('undecided', 'decided', 'fits_none', 'fits_several', 'overridden');--> statement-breakpoint
CREATE TABLE "categories" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"precedence" integer NOT NULL,
	"conditions" jsonb NOT NULL,
	"cap" integer,
	"merged_into_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "categories_cap_positive" CHECK ("categories"."cap" is null or "categories"."cap" > 0),
	CONSTRAINT "categories_not_merged_into_self" CHECK ("categories"."merged_into_id" is null or "categories"."merged_into_id" <> "categories"."id")
);
--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "category_overlap" text DEFAULT 'flag' NOT NULL;--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "size_tolerance_um" integer DEFAULT 25400 NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "category_id" uuid;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "category_state" "category_state" DEFAULT 'undecided' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "category_reasons" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "category_candidate_ids" uuid[] DEFAULT '{}'::uuid[] NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "category_override_reason" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "category_decided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "waitlist_reason" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "measured_width_um" integer;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "measured_length_um" integer;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "measured_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "measured_by" text;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "size_flag" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "size_flag_reviewed_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "categories" ADD CONSTRAINT "categories_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "categories" ADD CONSTRAINT "categories_merged_into_fk" FOREIGN KEY ("merged_into_id") REFERENCES "public"."categories"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "categories_show_code" ON "categories" USING btree ("show_id","code");--> statement-breakpoint
CREATE INDEX "categories_show" ON "categories" USING btree ("show_id");--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_category_id_categories_id_fk" FOREIGN KEY ("category_id") REFERENCES "public"."categories"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_measured_by_user_id_fk" FOREIGN KEY ("measured_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "entries_show_category" ON "entries" USING btree ("show_id","category_id");--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_measured_positive" CHECK (("entries"."measured_width_um" is null) = ("entries"."measured_length_um" is null) and coalesce("entries"."measured_width_um", 1) > 0 and coalesce("entries"."measured_length_um", 1) > 0);