import { sql } from 'drizzle-orm';
import type { Database } from '../../../server/db/database';

/**
 * How each table's rows of one organisation are found. Counting only the organisation's rows
 * keeps the count steady while other test files write theirs in parallel. A table missing here
 * fails the fuzzer (`uncountedTables`), so a new table is counted too.
 */
// The organisation's studies come as an array ($2): `study_id = any($2)` is an index scan on
// each table, where a subquery lets the planner scan whole tables that other test files have
// filled with hundreds of thousands of rows (a fuzz run counts thousands of times).
const scopes: Record<string, string> = {
  organisations: 'id = $1',
  users: 'id in (select user_id from memberships where organisation_id = $1)',
  memberships: 'organisation_id = $1',
  invitations: 'organisation_id = $1',
  api_tokens: 'organisation_id = $1',
  studies: 'organisation_id = $1',
  study_members: `study_id = any($2::uuid[])`,
  questionnaires: `study_id = any($2::uuid[])`,
  questionnaire_versions: `questionnaire_id in (select id from questionnaires where study_id = any($2::uuid[]))`,
  sampling_points: `study_id = any($2::uuid[])`,
  routes: `study_id = any($2::uuid[])`,
  route_stops: `study_id = any($2::uuid[])`,
  interviews: `study_id = any($2::uuid[])`,
  interview_photos: `interview_id in (select id from interviews where study_id = any($2::uuid[]))`,
  photo_upload_chunks: `photo_id in (select p.id from interview_photos p join interviews i on i.id = p.interview_id where i.study_id = any($2::uuid[]))`,
  fits: `study_id = any($2::uuid[])`,
  schedule_versions: `study_id = any($2::uuid[])`,
  field_devices: 'organisation_id = $1',
  dataset_uploads: `study_id = any($2::uuid[])`,
  dataset_upload_chunks: `upload_id in (select id from dataset_uploads where study_id = any($2::uuid[]))`,
  datasets: `study_id = any($2::uuid[])`,
  dataset_fits: `study_id = any($2::uuid[])`,
  shelf_observation_rows: `study_id = any($2::uuid[])`,
  stated_interviews: `study_id = any($2::uuid[])`,
  stated_ladder_steps: `study_id = any($2::uuid[])`,
  stated_thresholds: `study_id = any($2::uuid[])`,
  stated_wtp_amounts: `study_id = any($2::uuid[])`,
  stated_card_intervals: `study_id = any($2::uuid[])`,
  stated_bid_answers: `study_id = any($2::uuid[])`,
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
  const studies = await db.$client.query<{ id: string }>(
    'select id from studies where organisation_id = $1',
    [organisationId],
  );
  const studyIds = studies.rows.map((row) => row.id);
  const result = await db.$client.query<Record<string, number>>(`select ${select}`, [
    organisationId,
    studyIds,
  ]);
  return result.rows[0] ?? {};
}
