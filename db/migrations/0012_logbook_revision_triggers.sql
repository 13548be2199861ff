-- Custom migration: the revision numbers of migration 0011, kept by the
-- database itself so that no write path of the app (or of a restore, an
-- import or a cascade) can forget them. Statement-level triggers with
-- transition tables: one upsert per statement, however many rows it wrote.
-- Every new revision is the next number of one sequence, so a number never
-- comes back, even after rows are deleted and written again.
CREATE SEQUENCE IF NOT EXISTS logbook_revision_seq;--> statement-breakpoint
CREATE OR REPLACE FUNCTION logbook_bump(ids uuid[]) RETURNS void AS $$
  -- Only vehicles that still exist (a cascade from a deleted vehicle has nothing to count).
  INSERT INTO logbook_revision (vehicle_id, revision)
  SELECT v.id, nextval('logbook_revision_seq') FROM vehicle v WHERE v.id = ANY(ids)
  ON CONFLICT (vehicle_id) DO UPDATE SET revision = excluded.revision;
$$ LANGUAGE sql;--> statement-breakpoint
-- Rows that carry vehicle_id (sets, checks, service entries, attachments, odometer readings, access log).
CREATE OR REPLACE FUNCTION logbook_touch_by_vehicle_id() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM logbook_bump(ARRAY(SELECT DISTINCT vehicle_id FROM new_rows));
  ELSIF TG_OP = 'DELETE' THEN
    PERFORM logbook_bump(ARRAY(SELECT DISTINCT vehicle_id FROM old_rows));
  ELSE
    PERFORM logbook_bump(ARRAY(SELECT vehicle_id FROM new_rows UNION SELECT vehicle_id FROM old_rows));
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE OR REPLACE FUNCTION logbook_touch_vehicle() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM logbook_bump(ARRAY(SELECT id FROM new_rows));
  ELSIF TG_OP = 'UPDATE' THEN
    PERFORM logbook_bump(ARRAY(SELECT id FROM new_rows));
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE OR REPLACE FUNCTION logbook_touch_by_set_id() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM logbook_bump(ARRAY(SELECT s.vehicle_id FROM tire_set s WHERE s.id IN (SELECT set_id FROM new_rows)));
  ELSIF TG_OP = 'DELETE' THEN
    PERFORM logbook_bump(ARRAY(SELECT s.vehicle_id FROM tire_set s WHERE s.id IN (SELECT set_id FROM old_rows)));
  ELSE
    PERFORM logbook_bump(ARRAY(SELECT s.vehicle_id FROM tire_set s WHERE s.id IN (SELECT set_id FROM new_rows UNION SELECT set_id FROM old_rows)));
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE OR REPLACE FUNCTION logbook_touch_by_check_id() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM logbook_bump(ARRAY(SELECT c.vehicle_id FROM tread_check c WHERE c.id IN (SELECT check_id FROM new_rows)));
  ELSIF TG_OP = 'DELETE' THEN
    PERFORM logbook_bump(ARRAY(SELECT c.vehicle_id FROM tread_check c WHERE c.id IN (SELECT check_id FROM old_rows)));
  ELSE
    PERFORM logbook_bump(ARRAY(SELECT c.vehicle_id FROM tread_check c WHERE c.id IN (SELECT check_id FROM new_rows UNION SELECT check_id FROM old_rows)));
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE TRIGGER vehicle_logbook_ins AFTER INSERT ON vehicle REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_vehicle();--> statement-breakpoint
CREATE TRIGGER vehicle_logbook_upd AFTER UPDATE ON vehicle REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_vehicle();--> statement-breakpoint
CREATE TRIGGER tire_set_logbook_ins AFTER INSERT ON tire_set REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER tire_set_logbook_upd AFTER UPDATE ON tire_set REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER tire_set_logbook_del AFTER DELETE ON tire_set REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER tread_check_logbook_ins AFTER INSERT ON tread_check REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER tread_check_logbook_upd AFTER UPDATE ON tread_check REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER tread_check_logbook_del AFTER DELETE ON tread_check REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER service_entry_logbook_ins AFTER INSERT ON service_entry REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER service_entry_logbook_upd AFTER UPDATE ON service_entry REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER service_entry_logbook_del AFTER DELETE ON service_entry REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER attachment_logbook_ins AFTER INSERT ON attachment REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER attachment_logbook_upd AFTER UPDATE ON attachment REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER attachment_logbook_del AFTER DELETE ON attachment REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER odometer_reading_logbook_ins AFTER INSERT ON odometer_reading REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER odometer_reading_logbook_upd AFTER UPDATE ON odometer_reading REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER odometer_reading_logbook_del AFTER DELETE ON odometer_reading REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER access_log_logbook_ins AFTER INSERT ON access_log REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER access_log_logbook_upd AFTER UPDATE ON access_log REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER access_log_logbook_del AFTER DELETE ON access_log REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_vehicle_id();--> statement-breakpoint
CREATE TRIGGER tire_logbook_ins AFTER INSERT ON tire REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_set_id();--> statement-breakpoint
CREATE TRIGGER tire_logbook_upd AFTER UPDATE ON tire REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_set_id();--> statement-breakpoint
CREATE TRIGGER tire_logbook_del AFTER DELETE ON tire REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_set_id();--> statement-breakpoint
CREATE TRIGGER tread_reading_logbook_ins AFTER INSERT ON tread_reading REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_check_id();--> statement-breakpoint
CREATE TRIGGER tread_reading_logbook_upd AFTER UPDATE ON tread_reading REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_check_id();--> statement-breakpoint
CREATE TRIGGER tread_reading_logbook_del AFTER DELETE ON tread_reading REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION logbook_touch_by_check_id();--> statement-breakpoint
-- What many logbooks show but no vehicle owns.
INSERT INTO shared_revision (id, revision) VALUES (1, 0) ON CONFLICT DO NOTHING;--> statement-breakpoint
CREATE OR REPLACE FUNCTION shared_revision_bump() RETURNS trigger AS $$
BEGIN
  UPDATE shared_revision SET revision = nextval('logbook_revision_seq') WHERE id = 1;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE TRIGGER user_name_shared_revision AFTER UPDATE OF name ON "user" FOR EACH STATEMENT EXECUTE FUNCTION shared_revision_bump();--> statement-breakpoint
CREATE TRIGGER organization_shared_revision AFTER UPDATE OF name OR DELETE ON organization FOR EACH STATEMENT EXECUTE FUNCTION shared_revision_bump();--> statement-breakpoint
CREATE TRIGGER driver_profile_shared_revision AFTER INSERT OR UPDATE OR DELETE ON driver_profile FOR EACH STATEMENT EXECUTE FUNCTION shared_revision_bump();
