ALTER TABLE "access_log" DROP CONSTRAINT "access_log_shop_id_organization_id_fk";
--> statement-breakpoint
ALTER TABLE "shop_pass" DROP CONSTRAINT "shop_pass_shop_id_organization_id_fk";
--> statement-breakpoint
ALTER TABLE "access_log" ALTER COLUMN "shop_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "shop_pass" ALTER COLUMN "shop_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "access_log" ADD COLUMN "shop_name" text;--> statement-breakpoint
ALTER TABLE "shop_pass" ADD COLUMN "shop_name" text;--> statement-breakpoint
ALTER TABLE "access_log" ADD CONSTRAINT "access_log_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_pass" ADD CONSTRAINT "shop_pass_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE set null ON UPDATE no action;