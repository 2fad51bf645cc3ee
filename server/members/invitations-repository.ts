import { and, desc, eq, gt, isNotNull, isNull, notExists, sql } from 'drizzle-orm';
import type { Invitation, InvitationRequest } from '@shared/members/invitation';
import type { Database, Executor } from '../db/database';
import { invitations, memberships, users } from '../db/schema';
import { invitationLifetimeMs, newInvitationToken } from './invitation-token';

type InvitationRow = typeof invitations.$inferSelect;

function toInvitation(row: InvitationRow, now = new Date()): Invitation {
  const status = row.acceptedAt ? 'accepted' : row.expiresAt <= now ? 'expired' : 'pending';
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    roles: row.roles,
    status,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
  };
}

export async function listInvitations(db: Database, organisationId: string): Promise<Invitation[]> {
  const rows = await db
    .select()
    .from(invitations)
    .where(eq(invitations.organisationId, organisationId))
    .orderBy(desc(invitations.createdAt));
  return rows.map((row) => toInvitation(row));
}

export async function createInvitation(
  db: Executor,
  organisationId: string,
  invitedBy: string,
  request: InvitationRequest,
): Promise<{ invitation: Invitation; token: string }> {
  const { token, tokenHash } = newInvitationToken();
  const [row] = await db
    .insert(invitations)
    .values({
      organisationId,
      invitedBy,
      email: request.email,
      name: request.name,
      roles: request.roles,
      tokenHash,
      expiresAt: new Date(Date.now() + invitationLifetimeMs),
    })
    .returning();
  return { invitation: toInvitation(row), token };
}

/**
 * A pending, unexpired invitation for the token's hash, or undefined. A link to an address that
 * has since joined the organisation (through another link) no longer works, so two links sent to
 * one address can never both be used.
 */
export async function findOpenInvitation(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(invitations)
    .where(
      and(
        eq(invitations.tokenHash, tokenHash),
        isNull(invitations.acceptedAt),
        gt(invitations.expiresAt, new Date()),
        notExists(
          db
            .select({ one: sql`1` })
            .from(memberships)
            .innerJoin(users, eq(users.id, memberships.userId))
            .where(
              and(
                eq(memberships.organisationId, invitations.organisationId),
                eq(sql`lower(${users.email})`, invitations.email),
              ),
            ),
        ),
      ),
    );
  return row;
}

/** The organisation's waiting (not accepted, not expired) invitation to an address, if any. */
export async function findWaitingInvitationTo(
  db: Executor,
  organisationId: string,
  email: string,
): Promise<Invitation | undefined> {
  const [row] = await db
    .select()
    .from(invitations)
    .where(
      and(
        eq(invitations.organisationId, organisationId),
        eq(invitations.email, email),
        isNull(invitations.acceptedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    )
    .limit(1);
  return row ? toInvitation(row) : undefined;
}

/**
 * Withdraws an invitation that has not been accepted. The row goes, and with it the token's hash,
 * so the link in the e-mail stops working at once. An accepted invitation is history: it stays.
 */
export async function withdrawInvitation(
  db: Executor,
  organisationId: string,
  invitationId: string,
): Promise<'withdrawn' | 'accepted' | 'missing'> {
  const ofOrganisation = and(
    eq(invitations.id, invitationId),
    eq(invitations.organisationId, organisationId),
  );
  const removed = await db
    .delete(invitations)
    .where(and(ofOrganisation, isNull(invitations.acceptedAt)))
    .returning({ id: invitations.id });
  if (removed.length > 0) return 'withdrawn';
  const [accepted] = await db
    .select({ id: invitations.id })
    .from(invitations)
    .where(and(ofOrganisation, isNotNull(invitations.acceptedAt)));
  return accepted ? 'accepted' : 'missing';
}
