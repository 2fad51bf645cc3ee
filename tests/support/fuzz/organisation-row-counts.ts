import { sql } from 'drizzle-orm';
import type { Database } from '../../../server/db/database';

/**
 * How each table's rows of one organisation are found. Counting only the organisation's rows
 * keeps the count steady while other test files write theirs in parallel. A table missing here
 * fails the fuzzer (`uncountedTables`), so a new table is counted too.
 */
const orgStudies = 'select id from studies where organisation_id = $1';
const scopes: Record<string, string> = {
  organisations: 'id = $1',
  users: 'id in (select user_id from memberships where organisation_id = $1)',
  memberships: 'organisation_id = $1',
  invitations: 'organisation_id = $1',
  api_tokens: 'organisation_id = $1',
  studies: 'organisation_id = $1',
  study_members: `study_id in (${orgStudies})`,
  questionnaires: `study_id in (${orgStudies})`,
  questionnaire_versions: `questionnaire_id in (select id from questionnaires where study_id in (${orgStudies}))`,
  sampling_points: `study_id in (${orgStudies})`,
  routes: `study_id in (${orgStudies})`,
  route_stops: `study_id in (${orgStudies})`,
  interviews: `study_id in (${orgStudies})`,
  interview_photos: `interview_id in (select id from interviews where study_id in (${orgStudies}))`,
  photo_upload_chunks: `photo_id in (select p.id from interview_photos p join interviews i on i.id = p.interview_id where i.study_id in (${orgStudies}))`,
  fits: `study_id in (${orgStudies})`,
  schedule_versions: `study_id in (${orgStudies})`,
  field_devices: 'organisation_id = $1',
  dataset_uploads: `study_id in (${orgStudies})`,
  dataset_upload_chunks: `upload_id in (select id from dataset_uploads where study_id in (${orgStudies}))`,
  datasets: `study_id in (${orgStudies})`,
  dataset_fits: `study_id in (${orgStudies})`,
  shelf_observation_rows: `study_id in (${orgStudies})`,
  stated_interviews: `study_id in (${orgStudies})`,
  stated_ladder_steps: `study_id in (${orgStudies})`,
  stated_thresholds: `study_id in (${orgStudies})`,
  stated_wtp_amounts: `study_id in (${orgStudies})`,
  stated_card_intervals: `study_id in (${orgStudies})`,
  stated_bid_answers: `study_id in (${orgStudies})`,
};
// Sign-in sessions belong to no organisation and change with every sign-in; rate-limit
// counters change with every call, refused or not, by design.
const notCounted = new Set(['sessions', 'rate_limits']);

/** Tables of the product's schema that the counts do not cover. */
export async function uncountedTables(db: Database): Promise<string[]> {
  const result = await db.execute<{ name: string }>(
    sql`select tablename as name from pg_tables where schemaname = 'public' order by 1`,
  );
  return result.rows
    .map((row) => row.name)
    .filter((name) => !(name in scopes) && !notCounted.has(name));
}

/** The organisation's rows in every table, by table name. */
export async function organisationRowCounts(
  db: Database,
  organisationId: string,
): Promise<Record<string, number>> {
  const select = Object.entries(scopes)
    .map(([table, where]) => `(select count(*) from ${table} where ${where})::int as ${table}`)
    .join(', ');
  const result = await db.$client.query<Record<string, number>>(`select ${select}`, [
    organisationId,
  ]);
  return result.rows[0] ?? {};
}
