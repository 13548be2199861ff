CREATE INDEX "vehicle_hand_on_accepted_by_idx" ON "vehicle_hand_on" USING btree ("accepted_by_user_id");--> statement-breakpoint
CREATE INDEX "vehicle_keeper_invited_by_idx" ON "vehicle_keeper" USING btree ("invited_by_user_id");--> statement-breakpoint
CREATE INDEX "vehicle_keeper_ended_by_idx" ON "vehicle_keeper" USING btree ("ended_by_user_id");