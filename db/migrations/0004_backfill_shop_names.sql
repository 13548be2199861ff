-- Custom migration (drizzle-kit generate --custom): the shop's name on the
-- pass and access-log rows written before the name was kept there.
UPDATE "shop_pass" SET "shop_name" = o."name" FROM "organization" o WHERE o."id" = "shop_pass"."shop_id" AND "shop_pass"."shop_name" IS NULL;
--> statement-breakpoint
UPDATE "access_log" SET "shop_name" = o."name" FROM "organization" o WHERE o."id" = "access_log"."shop_id" AND "access_log"."shop_name" IS NULL;
