ALTER TABLE "entries" ADD COLUMN "judge_anyway_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "judge_anyway_reason" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "entries" ADD COLUMN "judge_anyway_by" text;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_judge_anyway_by_user_id_fk" FOREIGN KEY ("judge_anyway_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;