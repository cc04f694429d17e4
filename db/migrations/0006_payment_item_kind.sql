CREATE TYPE "public"."fee_kind" AS ENUM('entry', 'late', 'critique');--> statement-breakpoint
ALTER TABLE "payment_items" ADD COLUMN "kind" "fee_kind";--> statement-breakpoint
-- Lines written before this column carried their kind only as the start of the description.
UPDATE "payment_items" SET "kind" = CASE
  WHEN "description" LIKE 'Late fee%' THEN 'late'::"fee_kind"
  WHEN "description" LIKE 'Critique fee%' THEN 'critique'::"fee_kind"
  ELSE 'entry'::"fee_kind"
END;--> statement-breakpoint
ALTER TABLE "payment_items" ALTER COLUMN "kind" SET NOT NULL;
