CREATE TABLE "session_revision" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"revision" bigint DEFAULT 0 NOT NULL,
	CONSTRAINT "session_revision_one_row" CHECK ("session_revision"."id" = 1)
);
