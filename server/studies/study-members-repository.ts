import { and, asc, eq, notInArray } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import {
  rolesBeyondOrganisation,
  type StudyMember,
  type StudyMemberCandidate,
} from '@shared/studies/study-member';
import type { Database, Executor } from '../db/database';
import { memberships, studyMembers, users } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';

const memberColumns = {
  userId: users.id,
  name: users.name,
  email: users.email,
  organisationRoles: memberships.roles,
};

/** The people working on a study, with their study and organisation roles. */
export async function listStudyMembers(
  db: Executor,
  studyId: string,
  organisationId: string,
): Promise<StudyMember[]> {
  return db
    .select({ ...memberColumns, roles: studyMembers.roles })
    .from(studyMembers)
    .innerJoin(users, eq(users.id, studyMembers.userId))
    .innerJoin(
      memberships,
      and(eq(memberships.userId, users.id), eq(memberships.organisationId, organisationId)),
    )
    .where(eq(studyMembers.studyId, studyId))
    .orderBy(asc(users.name));
}

/** Members of the organisation who are not yet on the study. */
export async function listStudyCandidates(
  db: Executor,
  studyId: string,
  organisationId: string,
): Promise<StudyMemberCandidate[]> {
  const onStudy = db
    .select({ userId: studyMembers.userId })
    .from(studyMembers)
    .where(eq(studyMembers.studyId, studyId));
  return db
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organisationId, organisationId), notInArray(users.id, onStudy)))
    .orderBy(asc(users.name));
}

/**
 * Adds an organisation member to the study or changes their study roles. The roles must be
 * ones the person holds in the organisation, and the study keeps at least one researcher.
 */
export async function setStudyMember(
  db: Database,
  studyId: string,
  organisationId: string,
  userId: string,
  roles: Role[],
): Promise<StudyMember> {
  return db.transaction(async (tx) => {
    const [person] = await tx
      .select({ roles: memberships.roles })
      .from(memberships)
      .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
    if (!person) throw notFound('That member of the organisation');
    const beyond = rolesBeyondOrganisation(roles, person.roles);
    if (beyond.length > 0) {
      throw new HttpError(
        400,
        'invalid-input',
        'A study role must be one the person holds in the organisation.',
        beyond.map((role) => ({
          path: `roles.${roles.indexOf(role)}`,
          message: `This person does not hold the ${role} role in the organisation`,
        })),
      );
    }
    if (!roles.includes('researcher')) await keepOneResearcher(tx, studyId, userId);
    await tx
      .insert(studyMembers)
      .values({ studyId, userId, roles })
      .onConflictDoUpdate({ target: [studyMembers.studyId, studyMembers.userId], set: { roles } });
    const members = await listStudyMembers(tx, studyId, organisationId);
    const member = members.find((m) => m.userId === userId);
    if (!member) throw notFound('That member of the organisation');
    return member;
  });
}

/** Takes a person off the study; the last researcher stays. */
export async function removeStudyMember(
  db: Database,
  studyId: string,
  userId: string,
): Promise<void> {
  await db.transaction(async (tx) => {
    await keepOneResearcher(tx, studyId, userId);
    const removed = await tx
      .delete(studyMembers)
      .where(and(eq(studyMembers.studyId, studyId), eq(studyMembers.userId, userId)))
      .returning({ userId: studyMembers.userId });
    if (removed.length === 0) throw notFound('That study member');
  });
}

/** Refuses a change that would leave the study with no researcher other than `userId`. */
async function keepOneResearcher(tx: Executor, studyId: string, userId: string): Promise<void> {
  const locked = await tx
    .select({ userId: studyMembers.userId, roles: studyMembers.roles })
    .from(studyMembers)
    .where(eq(studyMembers.studyId, studyId))
    .for('update');
  const others = locked.filter((m) => m.userId !== userId && m.roles.includes('researcher'));
  const isResearcher = locked.some((m) => m.userId === userId && m.roles.includes('researcher'));
  if (isResearcher && others.length === 0) {
    throw new HttpError(409, 'last-researcher', 'A study keeps at least one researcher.');
  }
}
