CREATE TYPE "public"."plan" AS ENUM('free', 'plus');--> statement-breakpoint
CREATE TYPE "public"."pressure_unit" AS ENUM('kpa', 'psi', 'bar');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('metric', 'imperial');--> statement-breakpoint
CREATE TYPE "public"."attachment_kind" AS ENUM('receipt', 'photo', 'document');--> statement-breakpoint
CREATE TYPE "public"."measure_method" AS ENUM('gauge', 'coin');--> statement-breakpoint
CREATE TYPE "public"."measured_by" AS ENUM('driver', 'shop');--> statement-breakpoint
CREATE TYPE "public"."odometer_unit" AS ENUM('km', 'mi');--> statement-breakpoint
CREATE TYPE "public"."service_kind" AS ENUM('fitting', 'seasonal_swap', 'rotation', 'balancing', 'alignment', 'puncture_repair', 'inspection');--> statement-breakpoint
CREATE TYPE "public"."set_kind" AS ENUM('summer', 'all_season', 'all_weather', 'winter');--> statement-breakpoint
CREATE TYPE "public"."set_state" AS ENUM('mounted', 'stored', 'retired');--> statement-breakpoint
CREATE TYPE "public"."tire_position" AS ENUM('front_left', 'front_right', 'rear_left', 'rear_right', 'spare');--> statement-breakpoint
CREATE TYPE "public"."pass_scope" AS ENUM('view', 'view_add');--> statement-breakpoint
CREATE TABLE "account" (
	"id" text PRIMARY KEY NOT NULL,
	"account_id" text NOT NULL,
	"provider_id" text NOT NULL,
	"user_id" text NOT NULL,
	"access_token" text,
	"refresh_token" text,
	"id_token" text,
	"access_token_expires_at" timestamp with time zone,
	"refresh_token_expires_at" timestamp with time zone,
	"scope" text,
	"password" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "invitation" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"email" text NOT NULL,
	"role" text,
	"status" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"inviter_id" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "member" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"user_id" text NOT NULL,
	"role" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "organization" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"slug" text NOT NULL,
	"logo" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"metadata" text,
	CONSTRAINT "organization_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "session" (
	"id" text PRIMARY KEY NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"token" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"ip_address" text,
	"user_agent" text,
	"user_id" text NOT NULL,
	"active_organization_id" text,
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
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"role" text,
	"banned" boolean DEFAULT false,
	"ban_reason" text,
	"ban_expires" timestamp with time zone,
	CONSTRAINT "user_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "verification" (
	"id" text PRIMARY KEY NOT NULL,
	"identifier" text NOT NULL,
	"value" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "driver_profile" (
	"user_id" text PRIMARY KEY NOT NULL,
	"units" "unit_system" DEFAULT 'metric' NOT NULL,
	"pressure_unit" "pressure_unit" DEFAULT 'kpa' NOT NULL,
	"timezone" text DEFAULT 'UTC' NOT NULL,
	"jurisdiction" text DEFAULT 'EU' NOT NULL,
	"plan" "plan" DEFAULT 'free' NOT NULL,
	"reminder_settings" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"email_reminders" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "email_opt_out" (
	"user_id" text NOT NULL,
	"kind" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fake_outbox" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"from_address" text NOT NULL,
	"to_addresses" jsonb NOT NULL,
	"subject" text NOT NULL,
	"html" text,
	"text" text,
	"tags" jsonb,
	"headers" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reminder_delivery" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" text NOT NULL,
	"reminder_id" text NOT NULL,
	"due_on" date NOT NULL,
	"channel" text DEFAULT 'email' NOT NULL,
	"status" text DEFAULT 'pending' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"provider_message_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "reminder_feed" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" text NOT NULL,
	"token_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"revoked_at" timestamp with time zone,
	"last_fetched_at" timestamp with time zone,
	CONSTRAINT "reminder_feed_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "attachment" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"set_id" uuid,
	"service_entry_id" uuid,
	"kind" "attachment_kind" NOT NULL,
	"file_name" text NOT NULL,
	"stored_name" text NOT NULL,
	"mime_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"uploaded_by_user_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachment_stored_name_unique" UNIQUE("stored_name")
);
--> statement-breakpoint
CREATE TABLE "odometer_reading" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"read_on" date NOT NULL,
	"odometer_km" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_entry" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"set_id" uuid,
	"kind" "service_kind" NOT NULL,
	"performed_on" date NOT NULL,
	"odometer_km" double precision,
	"cost_cents" integer,
	"notes" text,
	"shop_id" text,
	"author_user_id" text,
	"pass_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tire" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"set_id" uuid NOT NULL,
	"position" "tire_position" NOT NULL,
	"dot_code" text,
	"dot_week" integer,
	"dot_year" integer,
	"dot_week_start" date,
	"dot_precision" text,
	"new_depth_mm" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tire_set" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"label" text,
	"kind" "set_kind" NOT NULL,
	"size" text NOT NULL,
	"load_index" integer,
	"speed_symbol" text,
	"purchased_on" date,
	"price_cents" integer,
	"currency" text DEFAULT 'EUR' NOT NULL,
	"seller" text,
	"state" "set_state" DEFAULT 'mounted' NOT NULL,
	"storage_location" text,
	"depth_limit_mm" double precision,
	"age_replace_years" double precision,
	"age_watch_years" double precision,
	"fitted_by_shop_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tread_check" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"set_id" uuid NOT NULL,
	"checked_on" date NOT NULL,
	"odometer_km" double precision,
	"measured_by" "measured_by" DEFAULT 'driver' NOT NULL,
	"method" "measure_method" DEFAULT 'gauge' NOT NULL,
	"shop_id" text,
	"author_user_id" text,
	"service_entry_id" uuid,
	"pass_id" uuid,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tread_reading" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"check_id" uuid NOT NULL,
	"tire_id" uuid NOT NULL,
	"inner_mm" double precision,
	"centre_mm" double precision,
	"outer_mm" double precision,
	"pressure_kpa" double precision,
	"approximate" boolean DEFAULT false NOT NULL
);
--> statement-breakpoint
CREATE TABLE "vehicle" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"nickname" text NOT NULL,
	"make" text NOT NULL,
	"model" text NOT NULL,
	"year" integer,
	"vin" text,
	"plate" text,
	"placard_front_size" text,
	"placard_rear_size" text,
	"placard_front_kpa" double precision,
	"placard_rear_kpa" double precision,
	"odometer_unit" "odometer_unit" DEFAULT 'km' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "access_log" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"pass_id" uuid NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"shop_id" text NOT NULL,
	"actor_user_id" text,
	"actor_name" text NOT NULL,
	"action" text NOT NULL,
	"detail" text,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shop_pass" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"driver_id" text NOT NULL,
	"shop_id" text NOT NULL,
	"scope" "pass_scope" NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"note" text,
	"end_notice_sent_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shop_pass_vehicle" (
	"pass_id" uuid NOT NULL,
	"vehicle_id" uuid NOT NULL,
	CONSTRAINT "shop_pass_vehicle_pass_id_vehicle_id_pk" PRIMARY KEY("pass_id","vehicle_id")
);
--> statement-breakpoint
CREATE TABLE "shop_profile" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"town" text NOT NULL,
	"address" text,
	"phone" text,
	"email" text,
	"about" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "account" ADD CONSTRAINT "account_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitation" ADD CONSTRAINT "invitation_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitation" ADD CONSTRAINT "invitation_inviter_id_user_id_fk" FOREIGN KEY ("inviter_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "member" ADD CONSTRAINT "member_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "member" ADD CONSTRAINT "member_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "session" ADD CONSTRAINT "session_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "driver_profile" ADD CONSTRAINT "driver_profile_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "email_opt_out" ADD CONSTRAINT "email_opt_out_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reminder_delivery" ADD CONSTRAINT "reminder_delivery_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reminder_feed" ADD CONSTRAINT "reminder_feed_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachment" ADD CONSTRAINT "attachment_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachment" ADD CONSTRAINT "attachment_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachment" ADD CONSTRAINT "attachment_set_id_tire_set_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."tire_set"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachment" ADD CONSTRAINT "attachment_service_entry_id_service_entry_id_fk" FOREIGN KEY ("service_entry_id") REFERENCES "public"."service_entry"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachment" ADD CONSTRAINT "attachment_uploaded_by_user_id_user_id_fk" FOREIGN KEY ("uploaded_by_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "odometer_reading" ADD CONSTRAINT "odometer_reading_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_entry" ADD CONSTRAINT "service_entry_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_entry" ADD CONSTRAINT "service_entry_set_id_tire_set_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."tire_set"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_entry" ADD CONSTRAINT "service_entry_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_entry" ADD CONSTRAINT "service_entry_author_user_id_user_id_fk" FOREIGN KEY ("author_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tire" ADD CONSTRAINT "tire_set_id_tire_set_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."tire_set"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tire_set" ADD CONSTRAINT "tire_set_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tire_set" ADD CONSTRAINT "tire_set_fitted_by_shop_id_organization_id_fk" FOREIGN KEY ("fitted_by_shop_id") REFERENCES "public"."organization"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_check" ADD CONSTRAINT "tread_check_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_check" ADD CONSTRAINT "tread_check_set_id_tire_set_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."tire_set"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_check" ADD CONSTRAINT "tread_check_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_check" ADD CONSTRAINT "tread_check_author_user_id_user_id_fk" FOREIGN KEY ("author_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_check" ADD CONSTRAINT "tread_check_service_entry_id_service_entry_id_fk" FOREIGN KEY ("service_entry_id") REFERENCES "public"."service_entry"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_reading" ADD CONSTRAINT "tread_reading_check_id_tread_check_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."tread_check"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_reading" ADD CONSTRAINT "tread_reading_tire_id_tire_id_fk" FOREIGN KEY ("tire_id") REFERENCES "public"."tire"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle" ADD CONSTRAINT "vehicle_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "access_log" ADD CONSTRAINT "access_log_pass_id_shop_pass_id_fk" FOREIGN KEY ("pass_id") REFERENCES "public"."shop_pass"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "access_log" ADD CONSTRAINT "access_log_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "access_log" ADD CONSTRAINT "access_log_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "access_log" ADD CONSTRAINT "access_log_actor_user_id_user_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_pass" ADD CONSTRAINT "shop_pass_driver_id_user_id_fk" FOREIGN KEY ("driver_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_pass" ADD CONSTRAINT "shop_pass_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_pass_vehicle" ADD CONSTRAINT "shop_pass_vehicle_pass_id_shop_pass_id_fk" FOREIGN KEY ("pass_id") REFERENCES "public"."shop_pass"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_pass_vehicle" ADD CONSTRAINT "shop_pass_vehicle_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_profile" ADD CONSTRAINT "shop_profile_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "account_user_id_idx" ON "account" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "invitation_organization_id_idx" ON "invitation" USING btree ("organization_id");--> statement-breakpoint
CREATE INDEX "invitation_email_idx" ON "invitation" USING btree ("email");--> statement-breakpoint
CREATE INDEX "member_organization_id_idx" ON "member" USING btree ("organization_id");--> statement-breakpoint
CREATE INDEX "member_user_id_idx" ON "member" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "member_org_user_uq" ON "member" USING btree ("organization_id","user_id");--> statement-breakpoint
CREATE INDEX "session_user_id_idx" ON "session" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "verification_identifier_idx" ON "verification" USING btree ("identifier");--> statement-breakpoint
CREATE UNIQUE INDEX "email_opt_out_uq" ON "email_opt_out" USING btree ("user_id","kind");--> statement-breakpoint
CREATE INDEX "fake_outbox_created_idx" ON "fake_outbox" USING btree ("created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "reminder_delivery_uq" ON "reminder_delivery" USING btree ("user_id","reminder_id","due_on","channel");--> statement-breakpoint
CREATE INDEX "reminder_feed_user_idx" ON "reminder_feed" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "attachment_vehicle_idx" ON "attachment" USING btree ("vehicle_id");--> statement-breakpoint
CREATE INDEX "attachment_set_idx" ON "attachment" USING btree ("set_id");--> statement-breakpoint
CREATE INDEX "attachment_service_idx" ON "attachment" USING btree ("service_entry_id");--> statement-breakpoint
CREATE INDEX "odometer_reading_vehicle_idx" ON "odometer_reading" USING btree ("vehicle_id","read_on");--> statement-breakpoint
CREATE INDEX "service_entry_vehicle_idx" ON "service_entry" USING btree ("vehicle_id","performed_on");--> statement-breakpoint
CREATE INDEX "service_entry_shop_idx" ON "service_entry" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "tire_set_id_idx" ON "tire" USING btree ("set_id");--> statement-breakpoint
CREATE INDEX "tire_set_vehicle_idx" ON "tire_set" USING btree ("vehicle_id");--> statement-breakpoint
CREATE INDEX "tire_set_state_idx" ON "tire_set" USING btree ("vehicle_id","state");--> statement-breakpoint
CREATE INDEX "tread_check_vehicle_idx" ON "tread_check" USING btree ("vehicle_id","checked_on");--> statement-breakpoint
CREATE INDEX "tread_check_set_idx" ON "tread_check" USING btree ("set_id");--> statement-breakpoint
CREATE INDEX "tread_reading_check_idx" ON "tread_reading" USING btree ("check_id");--> statement-breakpoint
CREATE INDEX "tread_reading_tire_idx" ON "tread_reading" USING btree ("tire_id");--> statement-breakpoint
CREATE INDEX "vehicle_owner_id_idx" ON "vehicle" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "access_log_vehicle_idx" ON "access_log" USING btree ("vehicle_id","at");--> statement-breakpoint
CREATE INDEX "access_log_pass_idx" ON "access_log" USING btree ("pass_id");--> statement-breakpoint
CREATE INDEX "shop_pass_driver_idx" ON "shop_pass" USING btree ("driver_id");--> statement-breakpoint
CREATE INDEX "shop_pass_shop_idx" ON "shop_pass" USING btree ("shop_id","ends_at");--> statement-breakpoint
CREATE INDEX "shop_pass_vehicle_vehicle_idx" ON "shop_pass_vehicle" USING btree ("vehicle_id");--> statement-breakpoint
CREATE INDEX "shop_profile_town_idx" ON "shop_profile" USING btree ("town");