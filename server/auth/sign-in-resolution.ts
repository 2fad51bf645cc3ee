import { and, asc, eq, sql } from 'drizzle-orm';
import type { Database, Executor } from '../db/database';
import { invitations, memberships, users } from '../db/schema';
import { findOpenInvitation } from '../members/invitations-repository';
import { hashInvitationToken } from '../members/invitation-token';

export interface VerifiedIdentity {
  issuer: string;
  subject: string;
  email: string;
  name: string;
}

export type SignInOutcome =
  | { kind: 'member'; userId: string; organisationId: string }
  | { kind: 'no-access' }
  | { kind: 'deactivated' }
  | { kind: 'invitation-invalid' }
  | { kind: 'invitation-other-email'; invitedEmail: string };

/** A person in several organisations signs in to one where they are still active. */
const activeFirst = sql`${memberships.deactivatedAt} is not null`;

/** Finds or creates the user for a verified identity, binding the provider's subject on first use. */
async function upsertUser(tx: Executor, who: VerifiedIdentity) {
  const [user] = await tx
    .insert(users)
    .values({
      email: who.email,
      name: who.name || who.email,
      identityIssuer: who.issuer,
      identitySubject: who.subject,
    })
    .onConflictDoUpdate({
      target: users.email,
      set: {
        identityIssuer: sql`coalesce(${users.identityIssuer}, excluded.identity_issuer)`,
        identitySubject: sql`coalesce(${users.identitySubject}, excluded.identity_subject)`,
      },
    })
    .returning({ id: users.id });
  return user.id;
}

/**
 * Decides who a verified identity is in Fieldcurve. An invitation token (from the link) first
 * turns into a membership with its roles, in one transaction with marking it accepted, so a
 * token can never be used twice.
 */
export async function resolveSignIn(
  db: Database,
  who: VerifiedIdentity,
  invitationToken?: string,
): Promise<SignInOutcome> {
  return db.transaction(async (tx) => {
    if (invitationToken) {
      const invitation = await findOpenInvitation(tx, hashInvitationToken(invitationToken));
      if (!invitation) return { kind: 'invitation-invalid' };
      if (invitation.email !== who.email) {
        return { kind: 'invitation-other-email', invitedEmail: invitation.email };
      }
      const userId = await upsertUser(tx, who);
      await tx
        .insert(memberships)
        .values({ organisationId: invitation.organisationId, userId, roles: invitation.roles })
        .onConflictDoUpdate({
          target: [memberships.organisationId, memberships.userId],
          set: {
            roles: sql`array(select distinct unnest(${memberships.roles} || excluded.roles))`,
          },
        });
      await tx
        .update(invitations)
        .set({ acceptedAt: new Date() })
        .where(eq(invitations.id, invitation.id));
      const [joined] = await tx
        .select({ deactivatedAt: memberships.deactivatedAt })
        .from(memberships)
        .where(
          and(
            eq(memberships.organisationId, invitation.organisationId),
            eq(memberships.userId, userId),
          ),
        );
      // An invitation does not undo an admin's deactivation; reactivating does.
      if (joined?.deactivatedAt) return { kind: 'deactivated' };
      return { kind: 'member', userId, organisationId: invitation.organisationId };
    }
    const [known] = await tx
      .select({
        userId: users.id,
        organisationId: memberships.organisationId,
        deactivatedAt: memberships.deactivatedAt,
      })
      .from(users)
      .innerJoin(memberships, eq(memberships.userId, users.id))
      .where(and(eq(users.identityIssuer, who.issuer), eq(users.identitySubject, who.subject)))
      .orderBy(activeFirst, asc(memberships.createdAt))
      .limit(1);
    if (known?.deactivatedAt) return { kind: 'deactivated' };
    if (known)
      return { kind: 'member', userId: known.userId, organisationId: known.organisationId };
    // Seeded or pre-created users have an e-mail but no subject until their first sign-in.
    const [byEmail] = await tx
      .select({
        userId: users.id,
        organisationId: memberships.organisationId,
        subject: users.identitySubject,
        deactivatedAt: memberships.deactivatedAt,
      })
      .from(users)
      .innerJoin(memberships, eq(memberships.userId, users.id))
      .where(eq(users.email, who.email))
      .orderBy(activeFirst, asc(memberships.createdAt))
      .limit(1);
    if (!byEmail || (byEmail.subject && byEmail.subject !== who.subject))
      return { kind: 'no-access' };
    if (byEmail.deactivatedAt) return { kind: 'deactivated' };
    await upsertUser(tx, who);
    return { kind: 'member', userId: byEmail.userId, organisationId: byEmail.organisationId };
  });
}
