import { sql } from 'drizzle-orm';
import type { Database } from '../../server/db/database';

/**
 * `count` accepted interviews of the raw-data test study's questionnaire, written in one
 * set-based statement (answers varied by row number; invented).
 */
export async function insertManyInterviews(
  db: Database,
  study: { studyId: string; versionId: string; routeId: string; north: string; south: string },
  enumeratorId: string,
  count: number,
): Promise<void> {
  await db.execute(sql`
    INSERT INTO interviews (id, study_id, questionnaire_version_id, route_id, point_id,
      enumerator_id, status, answers, flags, started_at, finished_at, latitude, longitude,
      gps_accuracy_m)
    SELECT gen_random_uuid(), ${study.studyId}::uuid, ${study.versionId}::uuid,
      ${study.routeId}::uuid,
      CASE WHEN n % 3 = 0 THEN ${study.north}::uuid ELSE ${study.south}::uuid END,
      ${enumeratorId}::uuid, 'accepted',
      jsonb_build_object(
        'consent', jsonb_build_object('agreed', true),
        'ladder', jsonb_build_object('steps', jsonb_build_array(
          jsonb_build_object('priceMinor', 100, 'response', 'yes'),
          jsonb_build_object('priceMinor', 150, 'response', CASE WHEN n % 2 = 0 THEN 'yes' ELSE 'no' END))),
        'uses', jsonb_build_object('values', jsonb_build_array('first')),
        'income', jsonb_build_object('band', (ARRAY['low', 'middle', 'high'])[1 + n % 3]),
        'size', jsonb_build_object('people', 1 + n % 8),
        'shelf', jsonb_build_object('priceMinor', 200 + n % 50, 'packSize', 1, 'quantity', n % 20),
        'remarks', jsonb_build_object('value', 'Respondent ' || n || ' asked about the warranty')),
      '[]'::jsonb,
      timestamptz '2027-03-01 08:00Z' + n * interval '7 seconds',
      timestamptz '2027-03-01 08:10Z' + n * interval '7 seconds',
      -1 - (n % 100) / 1000.0, 36 + (n % 100) / 1000.0, 10
    FROM generate_series(1, ${count}) AS n`);
}
