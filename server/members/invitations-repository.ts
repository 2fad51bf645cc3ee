import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import type { Invitation, InvitationRequest } from '@shared/members/invitation';
import type { Database, Executor } from '../db/database';
import { invitations } from '../db/schema';
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

/** A pending, unexpired invitation for the token's hash, or undefined. */
export async function findOpenInvitation(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(invitations)
    .where(
      and(
        eq(invitations.tokenHash, tokenHash),
        isNull(invitations.acceptedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    );
  return row;
}
