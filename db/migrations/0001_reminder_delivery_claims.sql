ALTER TABLE "reminder_delivery" ADD COLUMN "claimed_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "reminder_delivery" ADD COLUMN "claim_id" text;--> statement-breakpoint
ALTER TABLE "reminder_delivery" ADD COLUMN "last_error" text;--> statement-breakpoint
CREATE INDEX "reminder_delivery_pending_idx" ON "reminder_delivery" USING btree ("status","claimed_at");