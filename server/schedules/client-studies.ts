import { and, eq, sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { studies, studyMembers } from '../db/schema';

/** The studies of their organisation in which a person is a client member. */
export async function clientStudyIds(
  db: Executor,
  who: { userId: string; organisationId: string },
): Promise<string[]> {
  const rows = await db
    .select({ id: studies.id })
    .from(studyMembers)
    .innerJoin(studies, eq(studies.id, studyMembers.studyId))
    .where(
      and(
        eq(studyMembers.userId, who.userId),
        eq(studies.organisationId, who.organisationId),
        sql`'client' = any(${studyMembers.roles})`,
      ),
    );
  return rows.map((r) => r.id);
}
