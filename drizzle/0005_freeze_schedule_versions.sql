-- A published demand schedule is what clients plan with and cite: no route, script or mistake may
-- change or delete it. A correction is a new version naming the one it replaces.
CREATE FUNCTION refuse_change_to_schedule_version() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'schedule version % is published and cannot be changed or deleted', OLD.id
    USING ERRCODE = 'check_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER schedule_versions_immutable
  BEFORE UPDATE OR DELETE ON schedule_versions
  FOR EACH ROW EXECUTE FUNCTION refuse_change_to_schedule_version();
