CREATE TABLE "judge_conflicts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"judge_user_id" text NOT NULL,
	"entry_id" uuid NOT NULL,
	"reason" text NOT NULL,
	"found_when" text NOT NULL,
	"found_at" timestamp with time zone DEFAULT now() NOT NULL,
	"decision" text,
	"decision_reason" text DEFAULT '' NOT NULL,
	"decided_by" text,
	"decided_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "judge_conflicts" ADD CONSTRAINT "judge_conflicts_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_conflicts" ADD CONSTRAINT "judge_conflicts_judge_user_id_user_id_fk" FOREIGN KEY ("judge_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_conflicts" ADD CONSTRAINT "judge_conflicts_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "judge_conflicts" ADD CONSTRAINT "judge_conflicts_decided_by_user_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "judge_conflicts_judge_entry" ON "judge_conflicts" USING btree ("judge_user_id","entry_id");--> statement-breakpoint
CREATE INDEX "judge_conflicts_show" ON "judge_conflicts" USING btree ("show_id");