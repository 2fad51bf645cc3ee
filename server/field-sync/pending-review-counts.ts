import { and, arrayContains, count, eq, inArray, sql } from 'drizzle-orm';
import type { PendingReviewCount } from '@shared/field-sync/review-queue';
import type { Actor } from '../auth/actor';
import type { Executor } from '../db/database';
import { interviews, studies, studyMembers } from '../db/schema';

/**
 * How many interviews wait for a decision in each study the actor supervises (and still may:
 * the organisation role is required too). Studies with nothing waiting are left out.
 */
export async function pendingReviewCounts(
  db: Executor,
  actor: Actor,
): Promise<PendingReviewCount[]> {
  if (!actor.roles.includes('supervisor')) return [];
  return db
    .select({
      studyId: interviews.studyId,
      pending: count(),
      flagged: sql<number>`(count(*) filter (where ${interviews.status} = 'flagged'))::int`,
    })
    .from(interviews)
    .innerJoin(studyMembers, eq(studyMembers.studyId, interviews.studyId))
    .innerJoin(studies, eq(studies.id, interviews.studyId))
    .where(
      and(
        eq(studyMembers.userId, actor.userId),
        arrayContains(studyMembers.roles, ['supervisor']),
        eq(studies.organisationId, actor.organisationId),
        inArray(interviews.status, ['received', 'flagged']),
      ),
    )
    .groupBy(interviews.studyId);
}
