import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { memberships, studies, studyMembers } from '../db/schema';

/**
 * The studies of their organisation in which a person is a client member, while they are still
 * an active client of the organisation (a stale study row grants nothing).
 */
export async function clientStudyIds(
  db: Executor,
  who: { userId: string; organisationId: string },
): Promise<string[]> {
  const rows = await db
    .select({ id: studies.id })
    .from(studyMembers)
    .innerJoin(studies, eq(studies.id, studyMembers.studyId))
    .innerJoin(
      memberships,
      and(
        eq(memberships.userId, studyMembers.userId),
        eq(memberships.organisationId, studies.organisationId),
        isNull(memberships.deactivatedAt),
        sql`'client' = any(${memberships.roles})`,
      ),
    )
    .where(
      and(
        eq(studyMembers.userId, who.userId),
        eq(studies.organisationId, who.organisationId),
        sql`'client' = any(${studyMembers.roles})`,
      ),
    );
  return rows.map((r) => r.id);
}
