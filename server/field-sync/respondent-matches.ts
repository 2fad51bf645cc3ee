import { sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import type { RespondentSlotKey } from './batch-keys';

/** Key of a respondent within a study. */
export const respondentSlot = (studyId: string, respondentKey: string) =>
  `${studyId}/${respondentKey}`;

/**
 * Stored interviews (rejected ones aside) with the same respondent as one of these items, by
 * `respondentSlot`. One query per batch, one probe of the (study, respondent key) index per
 * distinct pair. The probe is a LATERAL subquery so that it stays a probe whatever the planner
 * believes: as a plain join, with statistics from before a burst of syncs, it hashed every
 * interview of the study on every batch.
 */
export async function loadRespondentMatches(
  db: Executor,
  respondents: readonly RespondentSlotKey[],
): Promise<Map<string, string[]>> {
  const matches = new Map<string, string[]>();
  const distinct = new Map(
    respondents.map((r) => [respondentSlot(r.studyId, r.respondentKey), r] as const),
  );
  if (distinct.size === 0) return matches;
  const pairs = [...distinct.values()];
  const { rows } = await db.execute<{ id: string; studyId: string; respondentKey: string }>(sql`
    select i.id, p.study_id as "studyId", p.respondent_key as "respondentKey"
    from unnest(
      ${sql.param(pairs.map((p) => p.studyId))}::uuid[],
      ${sql.param(pairs.map((p) => p.respondentKey))}::text[]
    ) as p(study_id, respondent_key)
    cross join lateral (
      select id from interviews
      where study_id = p.study_id and respondent_key = p.respondent_key and status <> 'rejected'
    ) as i`);
  for (const row of rows) {
    const slot = respondentSlot(row.studyId, row.respondentKey);
    const ids = matches.get(slot);
    if (ids) ids.push(row.id);
    else matches.set(slot, [row.id]);
  }
  return matches;
}
