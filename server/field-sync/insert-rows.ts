import { sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import type { InterviewInsert, PhotoInsert } from './interview-row';

/**
 * Inserts many interviews and the photos they declare in ONE statement (hence atomically, with
 * no explicit transaction), each list passed as one JSON parameter and unpacked by
 * `jsonb_to_recordset`: building a VALUES list of thousands of parameters costs more in the
 * query builder than PostgreSQL spends storing the rows. ON CONFLICT (id) DO NOTHING skips ids
 * already stored, and their photos with them; answers the ids actually inserted.
 */
export async function insertInterviewRows(
  db: Executor,
  rows: readonly InterviewInsert[],
  photos: readonly PhotoInsert[],
): Promise<string[]> {
  if (rows.length === 0) return [];
  const result = await db.execute<{ id: string }>(sql`
    with inserted as (
      insert into interviews (id, study_id, questionnaire_version_id, route_id, point_id,
        enumerator_id, status, answers, flags, started_at, finished_at, received_at, latitude,
        longitude, gps_accuracy_m, respondent_key, photo_count, complete_at)
      select r.id, r."studyId", r."questionnaireVersionId", r."routeId", r."pointId",
        r."enumeratorId", r.status::interview_status, r.answers, r.flags, r."startedAt",
        r."finishedAt", r."receivedAt", r.latitude, r.longitude, r."gpsAccuracyM",
        r."respondentKey", r."photoCount", r."completeAt"
      from jsonb_to_recordset(${JSON.stringify(rows)}::jsonb) as r(id uuid, "studyId" uuid,
        "questionnaireVersionId" uuid, "routeId" uuid, "pointId" uuid, "enumeratorId" uuid,
        status text, answers jsonb, flags jsonb, "startedAt" timestamptz,
        "finishedAt" timestamptz, "receivedAt" timestamptz, latitude float8, longitude float8,
        "gpsAccuracyM" float8, "respondentKey" text, "photoCount" int, "completeAt" timestamptz)
      on conflict (id) do nothing
      returning id
    ), declared as (
      insert into interview_photos (id, interview_id, sha256, byte_size, content_type)
      select p.id, p."interviewId", p.sha256, p."byteSize", p."contentType"
      from jsonb_to_recordset(${JSON.stringify(photos)}::jsonb) as p(id uuid,
        "interviewId" uuid, sha256 text, "byteSize" int, "contentType" text)
      where p."interviewId" in (select id from inserted)
      on conflict (id) do nothing
    )
    select id from inserted`);
  return result.rows.map((row) => row.id);
}

/** Inserts declared photos the same way; a photo id already stored is left as it is. */
export async function insertPhotoRows(tx: Executor, rows: readonly PhotoInsert[]): Promise<void> {
  if (rows.length === 0) return;
  await tx.execute(sql`
    insert into interview_photos (id, interview_id, sha256, byte_size, content_type)
    select r.id, r."interviewId", r.sha256, r."byteSize", r."contentType"
    from jsonb_to_recordset(${JSON.stringify(rows)}::jsonb) as r(id uuid, "interviewId" uuid,
      sha256 text, "byteSize" int, "contentType" text)
    on conflict (id) do nothing`);
}
