CREATE TYPE "public"."hand_on_state" AS ENUM('open', 'accepted', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."keeper_state" AS ENUM('invited', 'active', 'ended');--> statement-breakpoint
CREATE TABLE "operator_audit" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"actor_user_id" text NOT NULL,
	"actor_email" text NOT NULL,
	"action" text NOT NULL,
	"target_kind" text NOT NULL,
	"target_id" text NOT NULL,
	"target_label" text,
	"detail" text,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "vehicle_hand_on" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"from_user_id" text NOT NULL,
	"to_email" text,
	"token_hash" text NOT NULL,
	"include_receipts" boolean DEFAULT false NOT NULL,
	"keep_snapshot" boolean DEFAULT true NOT NULL,
	"state" "hand_on_state" DEFAULT 'open' NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_by_user_id" text,
	"accepted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vehicle_hand_on_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "vehicle_keeper" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"email" text NOT NULL,
	"user_id" text,
	"invited_by_user_id" text,
	"token_hash" text NOT NULL,
	"state" "keeper_state" DEFAULT 'invited' NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"ended_at" timestamp with time zone,
	"ended_by_user_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vehicle_keeper_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "vehicle_snapshot" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"title" text NOT NULL,
	"handed_on_at" timestamp with time zone NOT NULL,
	"data" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "vehicle_hand_on" ADD CONSTRAINT "vehicle_hand_on_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_hand_on" ADD CONSTRAINT "vehicle_hand_on_from_user_id_user_id_fk" FOREIGN KEY ("from_user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_hand_on" ADD CONSTRAINT "vehicle_hand_on_accepted_by_user_id_user_id_fk" FOREIGN KEY ("accepted_by_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_keeper" ADD CONSTRAINT "vehicle_keeper_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_keeper" ADD CONSTRAINT "vehicle_keeper_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_keeper" ADD CONSTRAINT "vehicle_keeper_invited_by_user_id_user_id_fk" FOREIGN KEY ("invited_by_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_keeper" ADD CONSTRAINT "vehicle_keeper_ended_by_user_id_user_id_fk" FOREIGN KEY ("ended_by_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_snapshot" ADD CONSTRAINT "vehicle_snapshot_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "operator_audit_at_idx" ON "operator_audit" USING btree ("at");--> statement-breakpoint
CREATE INDEX "vehicle_hand_on_vehicle_idx" ON "vehicle_hand_on" USING btree ("vehicle_id");--> statement-breakpoint
CREATE INDEX "vehicle_hand_on_from_idx" ON "vehicle_hand_on" USING btree ("from_user_id");--> statement-breakpoint
CREATE INDEX "vehicle_keeper_vehicle_idx" ON "vehicle_keeper" USING btree ("vehicle_id");--> statement-breakpoint
CREATE INDEX "vehicle_keeper_user_idx" ON "vehicle_keeper" USING btree ("user_id","state");--> statement-breakpoint
CREATE UNIQUE INDEX "vehicle_keeper_active_uq" ON "vehicle_keeper" USING btree ("vehicle_id","user_id") WHERE state = 'active';--> statement-breakpoint
CREATE INDEX "vehicle_snapshot_owner_idx" ON "vehicle_snapshot" USING btree ("owner_id");