-- A new PIN or password, a new role, or disabling the account ends every session of that user:
-- the session version carried in the cookie moves on, whichever code path (or person at psql)
-- made the change.
CREATE OR REPLACE FUNCTION hitchmark_end_sessions() RETURNS trigger AS $$
BEGIN
  NEW.session_version := OLD.session_version + 1;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER users_end_sessions BEFORE UPDATE OF secret_hash, role, is_active ON users
  FOR EACH ROW
  WHEN (OLD.secret_hash IS DISTINCT FROM NEW.secret_hash OR OLD.role IS DISTINCT FROM NEW.role
    OR OLD.is_active IS DISTINCT FROM NEW.is_active)
  EXECUTE FUNCTION hitchmark_end_sessions();
