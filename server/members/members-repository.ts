import { and, asc, eq, sql } from 'drizzle-orm';
import type { Member } from '@shared/members/member';
import type { Role } from '@shared/auth/role';
import type { Database, Executor } from '../db/database';
import { memberships, users } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { keepStudyResearchers, revokeTokensOf, trimStudyRoles } from './member-lifecycle';

export async function listMembers(db: Database, organisationId: string): Promise<Member[]> {
  const rows = await db
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      roles: memberships.roles,
      joinedAt: memberships.createdAt,
      deactivatedAt: memberships.deactivatedAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organisationId, organisationId))
    .orderBy(asc(users.name));
  return rows.map((row) => ({
    ...row,
    joinedAt: row.joinedAt.toISOString(),
    deactivatedAt: row.deactivatedAt?.toISOString() ?? null,
  }));
}

/** The member of the organisation with this e-mail address (compared without case), if any. */
export async function findMemberByEmail(
  db: Executor,
  organisationId: string,
  email: string,
): Promise<{ userId: string; name: string } | undefined> {
  const [row] = await db
    .select({ userId: users.id, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(memberships.organisationId, organisationId),
        eq(sql`lower(${users.email})`, email.toLowerCase()),
      ),
    )
    .limit(1);
  return row;
}

/**
 * Replaces a member's roles. The organisation must keep at least one admin, or nobody could
 * manage it any more; the check and the update share one transaction with the rows locked.
 * A role taken away goes from every study too (study roles never exceed organisation roles),
 * and taking the client role away revokes the person's read-API tokens.
 */
export async function setMemberRoles(
  db: Database,
  organisationId: string,
  userId: string,
  roles: Role[],
): Promise<void> {
  await db.transaction(async (tx) => {
    const locked = await tx
      .select({
        userId: memberships.userId,
        roles: memberships.roles,
        deactivatedAt: memberships.deactivatedAt,
      })
      .from(memberships)
      .where(eq(memberships.organisationId, organisationId))
      .for('update');
    const target = locked.find((row) => row.userId === userId);
    if (!target) throw notFound('That member');
    const otherAdmins = locked.filter(
      (row) => row.userId !== userId && row.roles.includes('admin') && !row.deactivatedAt,
    );
    if (!roles.includes('admin') && otherAdmins.length === 0) {
      throw new HttpError(
        409,
        'last-admin',
        'The organisation must keep at least one administrator.',
      );
    }
    if (target.roles.includes('researcher') && !roles.includes('researcher'))
      await keepStudyResearchers(tx, organisationId, userId);
    await tx
      .update(memberships)
      .set({ roles })
      .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
    await trimStudyRoles(tx, organisationId, userId, roles);
    if (target.roles.includes('client') && !roles.includes('client'))
      await revokeTokensOf(tx, organisationId, userId, 'role-removed');
  });
}
