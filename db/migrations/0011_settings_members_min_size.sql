ALTER TABLE "show_settings" ADD COLUMN "member_emails" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "show_settings" ADD COLUMN "min_quilt_side_um" integer;