CREATE TABLE "logbook_revision" (
	"vehicle_id" uuid PRIMARY KEY NOT NULL,
	"revision" bigint DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shared_revision" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"revision" bigint DEFAULT 0 NOT NULL,
	CONSTRAINT "shared_revision_one_row" CHECK ("shared_revision"."id" = 1)
);
--> statement-breakpoint
ALTER TABLE "logbook_revision" ADD CONSTRAINT "logbook_revision_vehicle_id_vehicle_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle"("id") ON DELETE cascade ON UPDATE no action;