import { createHash, randomBytes } from 'node:crypto';

/** A fresh invitation token for the link; only its hash is stored. */
export function newInvitationToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashInvitationToken(token) };
}

export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Invitations stay valid for a week: long enough for field staff who are offline for days. */
export const invitationLifetimeMs = 7 * 24 * 60 * 60 * 1000;
