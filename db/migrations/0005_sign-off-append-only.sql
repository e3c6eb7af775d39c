-- The sign-off record is appended to, never rewritten: an UPDATE of a sign_off row is refused.
-- (Rows still go when their version is deleted with its sketch.)
CREATE OR REPLACE FUNCTION sign_off_append_only() RETURNS trigger AS $$
BEGIN
  IF NEW.actor_id IS NULL AND OLD.actor_id IS NOT NULL AND NEW.id = OLD.id AND NEW.step = OLD.step
    AND NEW.note = OLD.note AND NEW.at = OLD.at AND NEW.actor_name = OLD.actor_name THEN
    RETURN NEW; -- the account was deleted (ON DELETE SET NULL); the copied name stays
  END IF;
  RAISE EXCEPTION 'the sign-off record cannot be changed (entry % of version %)', OLD.id, OLD.version_id
    USING ERRCODE = 'check_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER sign_off_append_only BEFORE UPDATE ON sign_off
  FOR EACH ROW EXECUTE FUNCTION sign_off_append_only();
