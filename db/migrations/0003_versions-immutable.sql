-- A saved version never changes: what was saved (sketch, number, message, document, summary,
-- time) is refused an UPDATE. Only author_id may become NULL (the account was deleted).
CREATE OR REPLACE FUNCTION sketch_version_immutable() RETURNS trigger AS $$
BEGIN
  IF NEW.sketch_id IS DISTINCT FROM OLD.sketch_id
    OR NEW.number IS DISTINCT FROM OLD.number
    OR NEW.message IS DISTINCT FROM OLD.message
    OR NEW.document IS DISTINCT FROM OLD.document
    OR NEW.format_version IS DISTINCT FROM OLD.format_version
    OR NEW.status IS DISTINCT FROM OLD.status
    OR NEW.largest_reaction IS DISTINCT FROM OLD.largest_reaction
    OR NEW.summary IS DISTINCT FROM OLD.summary
    OR NEW.created_at IS DISTINCT FROM OLD.created_at
    OR (NEW.author_id IS DISTINCT FROM OLD.author_id AND NEW.author_id IS NOT NULL) THEN
    RAISE EXCEPTION 'sketch versions are immutable (version % of sketch %)', OLD.number, OLD.sketch_id
      USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER sketch_version_immutable BEFORE UPDATE ON sketch_version
  FOR EACH ROW EXECUTE FUNCTION sketch_version_immutable();
