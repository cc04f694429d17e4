CREATE TYPE "public"."show_role" AS ENUM('chair', 'judge', 'scribe', 'intake');--> statement-breakpoint
CREATE TYPE "public"."show_status" AS ENUM('draft', 'entries_open', 'entries_closed', 'judging', 'results_published', 'archived');--> statement-breakpoint
CREATE TYPE "public"."division" AS ENUM('open', 'youth', 'first_time');--> statement-breakpoint
CREATE TYPE "public"."entry_status" AS ENUM('draft', 'submitted', 'paid', 'accepted', 'declined', 'received', 'judged', 'hung', 'returned', 'withdrawn');--> statement-breakpoint
CREATE TYPE "public"."photo_view" AS ENUM('full', 'detail', 'other');--> statement-breakpoint
CREATE TYPE "public"."quilting_method" AS ENUM('hand', 'home_machine', 'frame_machine');--> statement-breakpoint
CREATE TABLE "account" (
	"id" text PRIMARY KEY NOT NULL,
	"account_id" text NOT NULL,
	"provider_id" text NOT NULL,
	"user_id" text NOT NULL,
	"access_token" text,
	"refresh_token" text,
	"id_token" text,
	"access_token_expires_at" timestamp,
	"refresh_token_expires_at" timestamp,
	"scope" text,
	"password" text,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_limit" (
	"id" text PRIMARY KEY NOT NULL,
	"key" text NOT NULL,
	"count" integer NOT NULL,
	"last_request" bigint NOT NULL,
	CONSTRAINT "rate_limit_key_unique" UNIQUE("key")
);
--> statement-breakpoint
CREATE TABLE "session" (
	"id" text PRIMARY KEY NOT NULL,
	"expires_at" timestamp NOT NULL,
	"token" text NOT NULL,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp NOT NULL,
	"ip_address" text,
	"user_agent" text,
	"user_id" text NOT NULL,
	"impersonated_by" text,
	CONSTRAINT "session_token_unique" UNIQUE("token")
);
--> statement-breakpoint
CREATE TABLE "user" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"email_verified" boolean DEFAULT false NOT NULL,
	"image" text,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp DEFAULT now() NOT NULL,
	"role" text,
	"banned" boolean DEFAULT false,
	"ban_reason" text,
	"ban_expires" timestamp,
	CONSTRAINT "user_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "verification" (
	"id" text PRIMARY KEY NOT NULL,
	"identifier" text NOT NULL,
	"value" text NOT NULL,
	"expires_at" timestamp NOT NULL,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "show_invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"email" text NOT NULL,
	"role" "show_role" NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by" text,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"accepted_by" text,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "show_invitations_tokenHash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "show_roles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"role" "show_role" NOT NULL,
	"granted_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shows" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"guild_name" text NOT NULL,
	"venue_name" text NOT NULL,
	"venue_address" text DEFAULT '' NOT NULL,
	"time_zone" text NOT NULL,
	"entry_opens_at" timestamp with time zone,
	"entry_closes_at" timestamp with time zone,
	"drop_off_starts_at" timestamp with time zone,
	"drop_off_ends_at" timestamp with time zone,
	"judging_starts_at" timestamp with time zone,
	"judging_ends_at" timestamp with time zone,
	"show_opens_at" timestamp with time zone,
	"show_closes_at" timestamp with time zone,
	"pick_up_starts_at" timestamp with time zone,
	"pick_up_ends_at" timestamp with time zone,
	"status" "show_status" DEFAULT 'draft' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shows_slug_unique" UNIQUE("slug"),
	CONSTRAINT "shows_slug_format" CHECK ("shows"."slug" ~ '^[a-z0-9]+(-[a-z0-9]+)*$')
);
--> statement-breakpoint
CREATE TABLE "entrant_profiles" (
	"user_id" text PRIMARY KEY NOT NULL,
	"display_name" text NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"address_line1" text DEFAULT '' NOT NULL,
	"address_line2" text DEFAULT '' NOT NULL,
	"city" text DEFAULT '' NOT NULL,
	"region" text DEFAULT '' NOT NULL,
	"postal_code" text DEFAULT '' NOT NULL,
	"country" text DEFAULT '' NOT NULL,
	"guild" text DEFAULT '' NOT NULL,
	"publish_name_consent" boolean DEFAULT false NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"entrant_user_id" text NOT NULL,
	"entry_number" integer,
	"title" text NOT NULL,
	"width_um" integer NOT NULL,
	"length_um" integer NOT NULL,
	"techniques" text[] DEFAULT '{}'::text[] NOT NULL,
	"made_by" text[] DEFAULT '{}'::text[] NOT NULL,
	"quilted_by" text DEFAULT '' NOT NULL,
	"quilted_for_hire" boolean DEFAULT false NOT NULL,
	"quilting_method" "quilting_method" NOT NULL,
	"pattern_source" text DEFAULT 'original' NOT NULL,
	"statement" text DEFAULT '' NOT NULL,
	"declared_value_cents" integer DEFAULT 0 NOT NULL,
	"judged" boolean DEFAULT true NOT NULL,
	"division" "division" DEFAULT 'open' NOT NULL,
	"status" "entry_status" DEFAULT 'draft' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "entries_size_positive" CHECK ("entries"."width_um" > 0 and "entries"."length_um" > 0),
	CONSTRAINT "entries_value_nonnegative" CHECK ("entries"."declared_value_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "entry_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"entry_id" uuid NOT NULL,
	"view" "photo_view" NOT NULL,
	"storage_key" text NOT NULL,
	"width_px" integer NOT NULL,
	"height_px" integer NOT NULL,
	"bytes" integer NOT NULL,
	"content_type" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "entry_photos_storageKey_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"object_id" text NOT NULL,
	"payload" jsonb NOT NULL,
	"created_at" timestamp with time zone NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "audit_log" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"actor_user_id" text,
	"show_id" uuid,
	"action" text NOT NULL,
	"subject_type" text NOT NULL,
	"subject_id" text NOT NULL,
	"before" jsonb,
	"after" jsonb,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "account" ADD CONSTRAINT "account_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "session" ADD CONSTRAINT "session_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_invitations" ADD CONSTRAINT "show_invitations_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_invitations" ADD CONSTRAINT "show_invitations_invited_by_user_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_invitations" ADD CONSTRAINT "show_invitations_accepted_by_user_id_fk" FOREIGN KEY ("accepted_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_roles" ADD CONSTRAINT "show_roles_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_roles" ADD CONSTRAINT "show_roles_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_roles" ADD CONSTRAINT "show_roles_granted_by_user_id_fk" FOREIGN KEY ("granted_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entrant_profiles" ADD CONSTRAINT "entrant_profiles_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_entrant_user_id_user_id_fk" FOREIGN KEY ("entrant_user_id") REFERENCES "public"."user"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_photos" ADD CONSTRAINT "entry_photos_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "account_userId_idx" ON "account" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "session_userId_idx" ON "session" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "verification_identifier_idx" ON "verification" USING btree ("identifier");--> statement-breakpoint
CREATE INDEX "show_invitations_show" ON "show_invitations" USING btree ("show_id");--> statement-breakpoint
CREATE UNIQUE INDEX "show_roles_user_show_role" ON "show_roles" USING btree ("user_id","show_id","role");--> statement-breakpoint
CREATE INDEX "show_roles_show" ON "show_roles" USING btree ("show_id");--> statement-breakpoint
CREATE UNIQUE INDEX "entries_show_number" ON "entries" USING btree ("show_id","entry_number");--> statement-breakpoint
CREATE INDEX "entries_entrant" ON "entries" USING btree ("entrant_user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "entry_photos_entry_view" ON "entry_photos" USING btree ("entry_id","view");--> statement-breakpoint
CREATE INDEX "audit_log_show_at" ON "audit_log" USING btree ("show_id","at");--> statement-breakpoint
CREATE INDEX "audit_log_subject" ON "audit_log" USING btree ("subject_type","subject_id");