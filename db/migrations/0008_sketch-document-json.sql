-- A version's document is kept as json, not jsonb: json stores the text as saved, so object keys
-- (the order the user gave the parameters and a case's overrides) come back in that order. jsonb
-- sorts keys (shorter first); rows saved before this keep the order jsonb gave them.
ALTER TABLE "sketch_version" ALTER COLUMN "document" SET DATA TYPE json USING "document"::json;
--> statement-breakpoint
-- json has no equality operator, so the immutability trigger compares the document as text (the
-- exact text saved; an UPDATE that leaves the column alone passes it through unchanged).
CREATE OR REPLACE FUNCTION sketch_version_immutable() RETURNS trigger AS $$
BEGIN
  IF NEW.sketch_id IS DISTINCT FROM OLD.sketch_id
    OR NEW.number IS DISTINCT FROM OLD.number
    OR NEW.message IS DISTINCT FROM OLD.message
    OR NEW.document::text IS DISTINCT FROM OLD.document::text
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
