CREATE TABLE "billing_customer" (
	"user_id" text PRIMARY KEY NOT NULL,
	"stripe_customer_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "billing_customer_stripe_customer_id_unique" UNIQUE("stripe_customer_id")
);
--> statement-breakpoint
CREATE TABLE "billing_event" (
	"stripe_event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "billing_subscription" (
	"stripe_subscription_id" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"stripe_customer_id" text NOT NULL,
	"status" text NOT NULL,
	"price_id" text,
	"interval" text,
	"amount" integer,
	"currency" text,
	"cancel_at_period_end" boolean DEFAULT false NOT NULL,
	"current_period_end" timestamp with time zone,
	"ended_at" timestamp with time zone,
	"described_at" timestamp with time zone NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fake_stripe_idempotency" (
	"key" text NOT NULL,
	"api_key" text NOT NULL,
	"status" integer NOT NULL,
	"body" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fake_stripe_object" (
	"id" text PRIMARY KEY NOT NULL,
	"object_type" text NOT NULL,
	"customer_id" text,
	"data" jsonb NOT NULL,
	"fake_flags" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "billing_customer" ADD CONSTRAINT "billing_customer_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_subscription" ADD CONSTRAINT "billing_subscription_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "billing_subscription_user_idx" ON "billing_subscription" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "fake_stripe_idempotency_uq" ON "fake_stripe_idempotency" USING btree ("api_key","key");--> statement-breakpoint
CREATE INDEX "fake_stripe_object_type_idx" ON "fake_stripe_object" USING btree ("object_type","created_at");--> statement-breakpoint
CREATE INDEX "fake_stripe_object_customer_idx" ON "fake_stripe_object" USING btree ("customer_id");--> statement-breakpoint
ALTER TABLE "driver_profile" DROP COLUMN "plan";--> statement-breakpoint
DROP TYPE "public"."plan";