-- A published questionnaire version is frozen: responses point at it, so no route, script or
-- mistake may change or delete it. Drafts stay editable.
CREATE FUNCTION refuse_change_to_published_version() RETURNS trigger AS $$
BEGIN
  IF OLD.status = 'published' THEN
    RAISE EXCEPTION 'questionnaire version % is published and cannot be changed', OLD.id
      USING ERRCODE = 'check_violation';
  END IF;
  RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER questionnaire_versions_frozen
  BEFORE UPDATE OR DELETE ON questionnaire_versions
  FOR EACH ROW EXECUTE FUNCTION refuse_change_to_published_version();
