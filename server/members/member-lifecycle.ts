import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import type { Database, Executor } from '../db/database';
import { apiTokens, fieldDevices, memberships, studies, studyMembers } from '../db/schema';
import { endSessions, sessionsOf } from '../auth/ended-session';
import { HttpError, notFound } from '../http/http-error';

type TokenRevocation = 'role-removed' | 'member-deactivated';

/**
 * Takes from a person's study roles every role the organisation no longer gives them (`keep`);
 * study rows left with no role go. Study roles never exceed organisation roles.
 */
export async function trimStudyRoles(
  tx: Executor,
  organisationId: string,
  userId: string,
  keep: readonly Role[],
): Promise<void> {
  const inOrganisation = sql`${studyMembers.studyId} in (select ${studies.id} from ${studies} where ${studies.organisationId} = ${organisationId})`;
  const mine = and(eq(studyMembers.userId, userId), inOrganisation);
  const keepLiteral = `{${keep.join(',')}}`;
  const kept = sql`array(select unnest(${studyMembers.roles}) intersect select unnest(${keepLiteral}::role[]))::role[]`;
  await tx.update(studyMembers).set({ roles: kept }).where(mine);
  await tx.delete(studyMembers).where(and(mine, sql`cardinality(${studyMembers.roles}) = 0`));
}

/**
 * Refuses a change that would leave a study of the organisation with no researcher, naming the
 * study: someone must still be able to run it.
 */
export async function keepStudyResearchers(
  tx: Executor,
  organisationId: string,
  userId: string,
): Promise<void> {
  const [orphaned] = await tx
    .select({ name: studies.name })
    .from(studyMembers)
    .innerJoin(studies, eq(studies.id, studyMembers.studyId))
    .where(
      and(
        eq(studyMembers.userId, userId),
        eq(studies.organisationId, organisationId),
        sql`'researcher' = any(${studyMembers.roles})`,
        sql`not exists (select 1 from ${studyMembers} other
              join ${memberships} m on m.user_id = other.user_id and m.organisation_id = ${organisationId}
             where other.study_id = ${studies.id} and other.user_id <> ${userId}
               and 'researcher' = any(other.roles) and 'researcher' = any(m.roles)
               and m.deactivated_at is null)`,
      ),
    )
    .limit(1);
  if (orphaned) {
    throw new HttpError(
      409,
      'last-researcher',
      `This person is the only researcher of the study “${orphaned.name}”. Add another researcher to it first.`,
    );
  }
}

/** Revokes every live read-API token the person holds in the organisation, saying why. */
export async function revokeTokensOf(
  tx: Executor,
  organisationId: string,
  userId: string,
  reason: TokenRevocation,
): Promise<void> {
  await tx
    .update(apiTokens)
    .set({ revokedAt: new Date(), revokedReason: reason })
    .where(
      and(
        eq(apiTokens.userId, userId),
        eq(apiTokens.organisationId, organisationId),
        isNull(apiTokens.revokedAt),
      ),
    );
}

/** The membership row, locked for the change. */
async function lockedMembership(tx: Executor, organisationId: string, userId: string) {
  const [row] = await tx
    .select({ roles: memberships.roles, deactivatedAt: memberships.deactivatedAt })
    .from(memberships)
    .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)))
    .for('update');
  if (!row) throw notFound('That member');
  return row;
}

/**
 * Deactivates a member: their sessions end, their study roles and tokens are revoked, and sign-in
 * is refused; the membership and everything they recorded stay (history is kept). The last
 * active admin cannot be deactivated, nor the last researcher of a study.
 */
export async function deactivateMember(
  db: Database,
  organisationId: string,
  userId: string,
  byUserId: string,
): Promise<void> {
  await db.transaction(async (tx) => {
    const all = await tx
      .select({ userId: memberships.userId, roles: memberships.roles })
      .from(memberships)
      .where(and(eq(memberships.organisationId, organisationId), isNull(memberships.deactivatedAt)))
      .for('update');
    const target = await lockedMembership(tx, organisationId, userId);
    if (target.deactivatedAt) return;
    if (userId === byUserId) {
      throw new HttpError(409, 'own-account', 'You cannot deactivate your own account.');
    }
    const otherAdmins = all.filter((m) => m.userId !== userId && m.roles.includes('admin'));
    if (target.roles.includes('admin') && otherAdmins.length === 0) {
      throw new HttpError(
        409,
        'last-admin',
        'The organisation must keep at least one administrator.',
      );
    }
    await keepStudyResearchers(tx, organisationId, userId);
    await tx
      .update(memberships)
      .set({ deactivatedAt: new Date() })
      .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
    await trimStudyRoles(tx, organisationId, userId, []);
    await revokeTokensOf(tx, organisationId, userId, 'member-deactivated');
    await tx
      .update(fieldDevices)
      .set({ signedOutAt: new Date(), signedOutBy: byUserId })
      .where(
        and(
          eq(fieldDevices.userId, userId),
          eq(fieldDevices.organisationId, organisationId),
          isNull(fieldDevices.signedOutAt),
        ),
      );
    await endSessions(tx, sessionsOf(userId, organisationId), 'member-deactivated');
  });
}

/**
 * Lets a deactivated member sign in again with their organisation roles; study roles and tokens
 * are not given back (a researcher adds them to studies again, a client issues new tokens).
 */
export async function reactivateMember(
  db: Database,
  organisationId: string,
  userId: string,
): Promise<void> {
  await db.transaction(async (tx) => {
    await lockedMembership(tx, organisationId, userId);
    await tx
      .update(memberships)
      .set({ deactivatedAt: null })
      .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
  });
}
