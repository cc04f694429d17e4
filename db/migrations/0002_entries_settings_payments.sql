CREATE TYPE "public"."payment_status" AS ENUM('open', 'paid', 'expired', 'refunded', 'partially_refunded');--> statement-breakpoint
CREATE TABLE "show_entry_counters" (
	"show_id" uuid PRIMARY KEY NOT NULL,
	"last_number" integer DEFAULT 100 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "show_rules_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"rules_text" text NOT NULL,
	"release_text" text NOT NULL,
	"published_by" text,
	"published_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "show_settings" (
	"show_id" uuid PRIMARY KEY NOT NULL,
	"late_fee_from_at" timestamp with time zone,
	"entry_fee_cents" integer DEFAULT 0 NOT NULL,
	"member_entry_fee_cents" integer DEFAULT 0 NOT NULL,
	"late_fee_cents" integer DEFAULT 0 NOT NULL,
	"critique_fee_cents" integer DEFAULT 0 NOT NULL,
	"fee_cap_cents" integer,
	"withdrawal_refund_percent" integer DEFAULT 100 NOT NULL,
	"currency" text DEFAULT 'usd' NOT NULL,
	"max_entries_per_entrant" integer,
	"max_entries_per_category" integer,
	"capacity" integer,
	"required_photo_views" text[] DEFAULT '{full,detail}'::text[] NOT NULL,
	"photo_min_width_px" integer DEFAULT 1000 NOT NULL,
	"photo_min_height_px" integer DEFAULT 500 NOT NULL,
	"photo_max_bytes" integer DEFAULT 5000000 NOT NULL,
	"statement_word_limit" integer DEFAULT 150 NOT NULL,
	"techniques" text[] DEFAULT '{pieced,appliqué,mixed,art,modern,wholecloth,paper piecing,embroidery}'::text[] NOT NULL,
	"juried" boolean DEFAULT false NOT NULL,
	"publish_names" boolean DEFAULT true NOT NULL,
	"reply_to_email" text DEFAULT '' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payment_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"payment_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"amount_cents" integer NOT NULL,
	"description" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"entrant_user_id" text NOT NULL,
	"checkout_session_id" text,
	"amount_cents" integer NOT NULL,
	"refunded_cents" integer DEFAULT 0 NOT NULL,
	"currency" text NOT NULL,
	"status" "payment_status" DEFAULT 'open' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"paid_at" timestamp with time zone,
	CONSTRAINT "payments_checkoutSessionId_unique" UNIQUE("checkout_session_id")
);
--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "size_unit" text DEFAULT 'in' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "pattern_name" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "pattern_designer" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "for_sale" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "price_cents" integer;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "youth_age" integer;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "critique_requested" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "rules_version_id" uuid;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "rules_accepted_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "submitted_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "waitlisted" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "decision_reason" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "decision_released_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "paid_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "payment_reference" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "withdrawn_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entry_photos" ADD COLUMN "web_key" text;--> statement-breakpoint
ALTER TABLE "entry_photos" ADD COLUMN "thumb_key" text;--> statement-breakpoint
ALTER TABLE "show_entry_counters" ADD CONSTRAINT "show_entry_counters_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_rules_versions" ADD CONSTRAINT "show_rules_versions_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_rules_versions" ADD CONSTRAINT "show_rules_versions_published_by_user_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_settings" ADD CONSTRAINT "show_settings_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payment_items" ADD CONSTRAINT "payment_items_payment_id_payments_id_fk" FOREIGN KEY ("payment_id") REFERENCES "public"."payments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payment_items" ADD CONSTRAINT "payment_items_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_entrant_user_id_user_id_fk" FOREIGN KEY ("entrant_user_id") REFERENCES "public"."user"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "show_rules_versions_show_version" ON "show_rules_versions" USING btree ("show_id","version");--> statement-breakpoint
CREATE INDEX "payment_items_entry" ON "payment_items" USING btree ("entry_id");--> statement-breakpoint
CREATE INDEX "payments_entrant" ON "payments" USING btree ("entrant_user_id");--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_size_unit" CHECK ("entries"."size_unit" in ('in', 'cm'));