import { and, asc, eq, sql } from 'drizzle-orm';
import type { StudyEnumerator } from '@shared/routes/field-route';
import type { Executor } from '../db/database';
import { memberships, studies, studyMembers, users } from '../db/schema';

/**
 * People a route of the study can go to: study members holding the enumerator role in the
 * study and, still, in the organisation (without it they could not open the route).
 */
export async function listStudyEnumerators(
  db: Executor,
  studyId: string,
  userId?: string,
): Promise<StudyEnumerator[]> {
  return db
    .select({ userId: users.id, name: users.name, email: users.email })
    .from(studyMembers)
    .innerJoin(studies, eq(studies.id, studyMembers.studyId))
    .innerJoin(users, eq(users.id, studyMembers.userId))
    .innerJoin(
      memberships,
      and(
        eq(memberships.userId, studyMembers.userId),
        eq(memberships.organisationId, studies.organisationId),
      ),
    )
    .where(
      and(
        eq(studyMembers.studyId, studyId),
        sql`'enumerator' = any(${studyMembers.roles})`,
        sql`'enumerator' = any(${memberships.roles})`,
        userId === undefined ? undefined : eq(users.id, userId),
      ),
    )
    .orderBy(asc(users.name));
}

/** The enumerator with this id in the study, or undefined when they are not one. */
export async function findStudyEnumerator(
  db: Executor,
  studyId: string,
  userId: string,
): Promise<StudyEnumerator | undefined> {
  const [found] = await listStudyEnumerators(db, studyId, userId);
  return found;
}
