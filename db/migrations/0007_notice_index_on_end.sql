DROP INDEX "shop_pass_notice_due_idx";--> statement-breakpoint
CREATE INDEX "shop_pass_notice_due_idx" ON "shop_pass" USING btree ("ended_at") WHERE end_notice_sent_at is null;