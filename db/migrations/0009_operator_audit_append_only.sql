-- Custom SQL migration file, put your code below! ---- Custom migration: the operators' audit log is append-only for everyone,
-- the app included. UPDATE and DELETE are refused by the database itself.
CREATE OR REPLACE FUNCTION operator_audit_refuse_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'operator_audit is append-only';
END;
$$ LANGUAGE plpgsql;--> statement-breakpoint
CREATE TRIGGER operator_audit_no_update BEFORE UPDATE OR DELETE ON operator_audit FOR EACH ROW EXECUTE FUNCTION operator_audit_refuse_change();--> statement-breakpoint
CREATE TRIGGER operator_audit_no_truncate BEFORE TRUNCATE ON operator_audit FOR EACH STATEMENT EXECUTE FUNCTION operator_audit_refuse_change();
