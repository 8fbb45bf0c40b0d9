-- Two roles. The owner (who runs this migration) keeps every right; the app's role
-- `hitchmark_app` may only add to and read the record tables, never change, delete or empty them.
-- scripts/db.sh creates the role locally; on a managed database create it (LOGIN) before migrating.
DO $$
BEGIN
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'hitchmark_app') THEN
    RAISE EXCEPTION 'role hitchmark_app does not exist: create it (CREATE ROLE hitchmark_app LOGIN PASSWORD ...) before migrating';
  END IF;
END $$;
--> statement-breakpoint
REVOKE ALL ON ALL TABLES IN SCHEMA public FROM hitchmark_app;
--> statement-breakpoint
GRANT USAGE ON SCHEMA public TO hitchmark_app;
--> statement-breakpoint
-- working tables: read and write as the app needs
GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO hitchmark_app;
--> statement-breakpoint
-- record tables: append and read only (the append-only triggers of migration 0001 stay as a second wall)
REVOKE UPDATE, DELETE, TRUNCATE ON handoffs, handoff_items, audit_log, case_events, findings, chain_anchors FROM hitchmark_app;
--> statement-breakpoint
GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO hitchmark_app;
--> statement-breakpoint
-- A table added by a later migration starts as a record table for the app (SELECT and INSERT);
-- a working table gets its UPDATE and DELETE by an explicit GRANT in the migration that adds it.
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT SELECT, INSERT ON TABLES TO hitchmark_app;
--> statement-breakpoint
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO hitchmark_app;
