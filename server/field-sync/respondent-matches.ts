import { sql } from 'drizzle-orm';
import type { Executor } from '../db/database';

/** Key of a respondent within a study. */
export const respondentSlot = (studyId: string, respondentKey: string) =>
  `${studyId}/${respondentKey}`;

/**
 * Stored interviews (rejected ones aside) of these studies that carry one of these respondent
 * keys, by `respondentSlot`. One query per batch: every (study, key) pair is probed on the
 * (study, respondent key) index. Written as a join on the lists, not `= any(…)` filters: with
 * filters, a planner unsure of the table's size chose the (study, status) index and read every
 * interview of the study on every batch.
 */
export async function loadRespondentMatches(
  db: Executor,
  studyIds: readonly string[],
  keys: readonly string[],
): Promise<Map<string, string[]>> {
  const matches = new Map<string, string[]>();
  if (keys.length === 0) return matches;
  const { rows } = await db.execute<{ id: string; studyId: string; respondentKey: string }>(sql`
    select i.id, i.study_id as "studyId", i.respondent_key as "respondentKey"
    from unnest(${sql.param([...new Set(studyIds)])}::uuid[]) as s(study_id)
    cross join unnest(${sql.param([...new Set(keys)])}::text[]) as k(respondent_key)
    join interviews i on i.study_id = s.study_id and i.respondent_key = k.respondent_key
    where i.status <> 'rejected'`);
  for (const row of rows) {
    const slot = respondentSlot(row.studyId, row.respondentKey);
    const ids = matches.get(slot);
    if (ids) ids.push(row.id);
    else matches.set(slot, [row.id]);
  }
  return matches;
}
