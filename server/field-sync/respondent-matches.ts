import { and, inArray, ne } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { interviews } from '../db/schema';

/** Key of a respondent within a study. */
export const respondentSlot = (studyId: string, respondentKey: string) =>
  `${studyId}/${respondentKey}`;

/**
 * Stored interviews (rejected ones aside) of these studies that carry one of these respondent
 * keys, by `respondentSlot`. One query per batch, on the (study, respondent key) index.
 */
export async function loadRespondentMatches(
  db: Executor,
  studyIds: readonly string[],
  keys: readonly string[],
): Promise<Map<string, string[]>> {
  const matches = new Map<string, string[]>();
  if (keys.length === 0) return matches;
  const rows = await db
    .select({
      id: interviews.id,
      studyId: interviews.studyId,
      respondentKey: interviews.respondentKey,
    })
    .from(interviews)
    .where(
      and(
        inArray(interviews.studyId, [...new Set(studyIds)]),
        inArray(interviews.respondentKey, [...new Set(keys)]),
        ne(interviews.status, 'rejected'),
      ),
    );
  for (const row of rows) {
    if (row.respondentKey === null) continue;
    const slot = respondentSlot(row.studyId, row.respondentKey);
    matches.set(slot, [...(matches.get(slot) ?? []), row.id]);
  }
  return matches;
}
