-- Records that must never change after the fact: the audit log, handoffs and their items.
-- A correction is a new handoff pointing at the one it corrects (corrects_handoff_id).
CREATE OR REPLACE FUNCTION hitchmark_refuse_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'table % is append-only: % refused', TG_TABLE_NAME, TG_OP USING ERRCODE = 'HM001';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER audit_log_append_only BEFORE UPDATE OR DELETE ON audit_log
  FOR EACH ROW EXECUTE FUNCTION hitchmark_refuse_change();
--> statement-breakpoint
CREATE TRIGGER handoffs_append_only BEFORE UPDATE OR DELETE ON handoffs
  FOR EACH ROW EXECUTE FUNCTION hitchmark_refuse_change();
--> statement-breakpoint
CREATE TRIGGER handoff_items_append_only BEFORE UPDATE OR DELETE ON handoff_items
  FOR EACH ROW EXECUTE FUNCTION hitchmark_refuse_change();
