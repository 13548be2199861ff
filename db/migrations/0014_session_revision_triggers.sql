-- Custom migration: the triggers of session_revision (migration 0013). Any
-- change or deletion of a session (sign-out, a revoke, a refresh) and any
-- change or deletion of a user (a ban, a new role, a new name) moves it; a
-- new session does not.
INSERT INTO session_revision (id, revision) VALUES (1, 0) ON CONFLICT DO NOTHING;--> statement-breakpoint
CREATE OR REPLACE FUNCTION session_revision_bump() RETURNS trigger AS $$
BEGIN
  UPDATE session_revision SET revision = nextval('logbook_revision_seq') WHERE id = 1;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE TRIGGER session_changed_revision AFTER UPDATE OR DELETE ON "session" FOR EACH STATEMENT EXECUTE FUNCTION session_revision_bump();--> statement-breakpoint
CREATE TRIGGER user_changed_session_revision AFTER UPDATE OR DELETE ON "user" FOR EACH STATEMENT EXECUTE FUNCTION session_revision_bump();--> statement-breakpoint
CREATE TRIGGER session_truncated_revision AFTER TRUNCATE ON "session" FOR EACH STATEMENT EXECUTE FUNCTION session_revision_bump();--> statement-breakpoint
CREATE TRIGGER user_truncated_revision AFTER TRUNCATE ON "user" FOR EACH STATEMENT EXECUTE FUNCTION session_revision_bump();
