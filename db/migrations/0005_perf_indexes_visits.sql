DROP INDEX "access_log_pass_idx";--> statement-breakpoint
DROP INDEX "shop_pass_driver_idx";--> statement-breakpoint
ALTER TABLE "reminder_feed" ADD COLUMN "content_tag" text;--> statement-breakpoint
ALTER TABLE "reminder_feed" ADD COLUMN "content_changed_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "access_log" ADD COLUMN "visit_start" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "access_log" ADD COLUMN "count" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "access_log" ADD COLUMN "last_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "shop_pass" ADD COLUMN "ended_at" timestamp with time zone GENERATED ALWAYS AS (least(ends_at, coalesce(revoked_at, ends_at))) STORED NOT NULL;--> statement-breakpoint
CREATE INDEX "invitation_inviter_id_idx" ON "invitation" USING btree ("inviter_id");--> statement-breakpoint
CREATE INDEX "attachment_owner_idx" ON "attachment" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "attachment_uploaded_by_idx" ON "attachment" USING btree ("uploaded_by_user_id");--> statement-breakpoint
CREATE INDEX "service_entry_set_idx" ON "service_entry" USING btree ("set_id");--> statement-breakpoint
CREATE INDEX "service_entry_pass_idx" ON "service_entry" USING btree ("pass_id");--> statement-breakpoint
CREATE INDEX "service_entry_author_idx" ON "service_entry" USING btree ("author_user_id");--> statement-breakpoint
CREATE INDEX "tire_set_fitted_by_shop_idx" ON "tire_set" USING btree ("fitted_by_shop_id");--> statement-breakpoint
CREATE INDEX "tread_check_pass_idx" ON "tread_check" USING btree ("pass_id");--> statement-breakpoint
CREATE INDEX "tread_check_service_entry_idx" ON "tread_check" USING btree ("service_entry_id");--> statement-breakpoint
CREATE INDEX "tread_check_shop_idx" ON "tread_check" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "tread_check_author_idx" ON "tread_check" USING btree ("author_user_id");--> statement-breakpoint
CREATE INDEX "access_log_shop_idx" ON "access_log" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "access_log_actor_idx" ON "access_log" USING btree ("actor_user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "access_log_visit_uq" ON "access_log" USING btree ("pass_id","vehicle_id","actor_user_id","action","visit_start");--> statement-breakpoint
CREATE INDEX "shop_pass_shop_ended_idx" ON "shop_pass" USING btree ("shop_id","ended_at");--> statement-breakpoint
CREATE INDEX "shop_pass_notice_due_idx" ON "shop_pass" USING btree ("ended_at") WHERE end_notice_sent_at is null;--> statement-breakpoint
CREATE INDEX "access_log_pass_idx" ON "access_log" USING btree ("pass_id","at");--> statement-breakpoint
CREATE INDEX "shop_pass_driver_idx" ON "shop_pass" USING btree ("driver_id","created_at");