-- Interviews arrive from sync hundreds per statement, all pointing at the same study, version,
-- route, enumerator and a few points. A row-level foreign key looks up and key-share-locks those
-- parents once per row (measured: about half the cost of storing the rows). These triggers give
-- the same guarantees once per statement: every referenced parent exists and stays locked
-- against deletion until the transaction ends, and a deleted parent takes its interviews with it
-- (study), clears the reference (route, point, enumerator) or is refused (questionnaire version),
-- as the foreign keys did.

-- Key-share-locks the rows of `parent` with these ids (NULLs ignored) and refuses the statement
-- when one of them does not exist, with the foreign-key error code.
CREATE FUNCTION lock_interview_parents(parent regclass, ids uuid[], what text) RETURNS void AS $$
DECLARE
  wanted bigint;
  held bigint;
BEGIN
  SELECT count(DISTINCT id) INTO wanted FROM unnest(ids) AS id;
  IF wanted = 0 THEN
    RETURN;
  END IF;
  EXECUTE format('SELECT count(*) FROM (SELECT 1 FROM %s WHERE id = ANY($1) FOR KEY SHARE) AS held',
                 parent)
    INTO held USING ids;
  IF held <> wanted THEN
    RAISE EXCEPTION 'an interview refers to a % that does not exist', what
      USING ERRCODE = 'foreign_key_violation', TABLE = 'interviews';
  END IF;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE FUNCTION check_interview_references() RETURNS trigger AS $$
BEGIN
  PERFORM lock_interview_parents('studies', ARRAY(SELECT study_id FROM added), 'study');
  PERFORM lock_interview_parents('questionnaire_versions',
    ARRAY(SELECT questionnaire_version_id FROM added), 'questionnaire version');
  PERFORM lock_interview_parents('routes', ARRAY(SELECT route_id FROM added), 'route');
  PERFORM lock_interview_parents('sampling_points', ARRAY(SELECT point_id FROM added), 'point');
  PERFORM lock_interview_parents('users', ARRAY(SELECT enumerator_id FROM added), 'enumerator');
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER interviews_references_on_insert
  AFTER INSERT ON interviews REFERENCING NEW TABLE AS added
  FOR EACH STATEMENT EXECUTE FUNCTION check_interview_references();
--> statement-breakpoint
-- An update checks only references it changed (as a foreign key does): clearing a deleted
-- route's references must not re-check a study that is being deleted in the same transaction.
CREATE FUNCTION check_changed_interview_references() RETURNS trigger AS $$
BEGIN
  PERFORM lock_interview_parents('studies', ARRAY(
    SELECT a.study_id FROM added a JOIN replaced r USING (id)
    WHERE a.study_id IS DISTINCT FROM r.study_id), 'study');
  PERFORM lock_interview_parents('questionnaire_versions', ARRAY(
    SELECT a.questionnaire_version_id FROM added a JOIN replaced r USING (id)
    WHERE a.questionnaire_version_id IS DISTINCT FROM r.questionnaire_version_id),
    'questionnaire version');
  PERFORM lock_interview_parents('routes', ARRAY(
    SELECT a.route_id FROM added a JOIN replaced r USING (id)
    WHERE a.route_id IS DISTINCT FROM r.route_id), 'route');
  PERFORM lock_interview_parents('sampling_points', ARRAY(
    SELECT a.point_id FROM added a JOIN replaced r USING (id)
    WHERE a.point_id IS DISTINCT FROM r.point_id), 'point');
  PERFORM lock_interview_parents('users', ARRAY(
    SELECT a.enumerator_id FROM added a JOIN replaced r USING (id)
    WHERE a.enumerator_id IS DISTINCT FROM r.enumerator_id), 'enumerator');
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER interviews_references_on_update
  AFTER UPDATE ON interviews REFERENCING OLD TABLE AS replaced NEW TABLE AS added
  FOR EACH STATEMENT EXECUTE FUNCTION check_changed_interview_references();
--> statement-breakpoint
-- What deleting a parent does to the interviews that refer to it. A version may go only with its
-- whole study (whose own trigger then deletes the interviews): the study row is already gone when
-- this runs, so interviews of a study being deleted do not hold the version back.
CREATE FUNCTION follow_deleted_interview_parent() RETURNS trigger AS $$
BEGIN
  CASE TG_TABLE_NAME
    WHEN 'studies' THEN
      DELETE FROM interviews WHERE study_id IN (SELECT id FROM gone);
    WHEN 'routes' THEN
      UPDATE interviews SET route_id = NULL WHERE route_id IN (SELECT id FROM gone);
    WHEN 'sampling_points' THEN
      UPDATE interviews SET point_id = NULL WHERE point_id IN (SELECT id FROM gone);
    WHEN 'users' THEN
      UPDATE interviews SET enumerator_id = NULL WHERE enumerator_id IN (SELECT id FROM gone);
    WHEN 'questionnaire_versions' THEN
      IF EXISTS (SELECT 1 FROM interviews i JOIN studies s ON s.id = i.study_id
                 WHERE i.questionnaire_version_id IN (SELECT id FROM gone)) THEN
        RAISE EXCEPTION 'a questionnaire version with interviews cannot be deleted'
          USING ERRCODE = 'foreign_key_violation', TABLE = 'questionnaire_versions';
      END IF;
  END CASE;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER interviews_follow_deleted_study
  AFTER DELETE ON studies REFERENCING OLD TABLE AS gone
  FOR EACH STATEMENT EXECUTE FUNCTION follow_deleted_interview_parent();
--> statement-breakpoint
CREATE TRIGGER interviews_follow_deleted_route
  AFTER DELETE ON routes REFERENCING OLD TABLE AS gone
  FOR EACH STATEMENT EXECUTE FUNCTION follow_deleted_interview_parent();
--> statement-breakpoint
CREATE TRIGGER interviews_follow_deleted_point
  AFTER DELETE ON sampling_points REFERENCING OLD TABLE AS gone
  FOR EACH STATEMENT EXECUTE FUNCTION follow_deleted_interview_parent();
--> statement-breakpoint
CREATE TRIGGER interviews_follow_deleted_enumerator
  AFTER DELETE ON users REFERENCING OLD TABLE AS gone
  FOR EACH STATEMENT EXECUTE FUNCTION follow_deleted_interview_parent();
--> statement-breakpoint
CREATE TRIGGER interviews_follow_deleted_version
  AFTER DELETE ON questionnaire_versions REFERENCING OLD TABLE AS gone
  FOR EACH STATEMENT EXECUTE FUNCTION follow_deleted_interview_parent();
