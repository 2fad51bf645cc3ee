import { and, eq } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import type { Database } from '../db/database';
import { studies, studyMembers } from '../db/schema';

/**
 * The roles a person holds in one study of their organisation, or undefined when the study is
 * not theirs to see (another organisation's study, not a member, or no such study). A study role
 * counts only while the person still holds it in the organisation: a row left behind by a
 * demotion grants nothing.
 */
export async function studyRolesOf(
  db: Database,
  studyId: string,
  who: { userId: string; organisationId: string; roles: readonly Role[] },
): Promise<Role[] | undefined> {
  const [row] = await db
    .select({ roles: studyMembers.roles })
    .from(studyMembers)
    .innerJoin(studies, eq(studies.id, studyMembers.studyId))
    .where(
      and(
        eq(studyMembers.studyId, studyId),
        eq(studyMembers.userId, who.userId),
        eq(studies.organisationId, who.organisationId),
      ),
    );
  const current = row?.roles.filter((role) => who.roles.includes(role)) ?? [];
  return current.length > 0 ? current : undefined;
}
