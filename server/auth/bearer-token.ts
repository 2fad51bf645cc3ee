import { createHash, randomBytes } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { Request, Response } from 'express';
import type { Database } from '../db/database';
import { apiTokens, memberships } from '../db/schema';
import { forbidden, HttpError } from '../http/http-error';

/** Who a read-API token acts for, and the studies it is restricted to (null: all of theirs). */
export interface TokenOwner {
  tokenId: string;
  userId: string;
  organisationId: string;
  studyIds: string[] | null;
}

/** Tokens are stored only as their SHA-256; a leaked table reveals no token. */
export const hashToken = (token: string) =>
  createHash('sha256').update(token, 'utf8').digest('hex');

/** A new token: a recognisable prefix and 32 random bytes. */
export function newToken(): string {
  return `fct_${randomBytes(32).toString('base64url')}`;
}

const revokedBecause: Readonly<Record<string, string>> = {
  owner: 'its owner revoked it',
  admin: 'an administrator revoked it',
  'role-removed': 'its owner no longer holds the client role',
  'member-deactivated': 'its owner’s access was deactivated',
};

const day = (date: Date) => date.toISOString().slice(0, 10);

/**
 * The owner of the token in an `Authorization: Bearer …` header, or why it does not work: no
 * such header, an unknown token, or one expired, revoked, or whose owner is no longer an active
 * client of the organisation (checked on every call, whatever the revocation rows say).
 */
export async function tokenOwnerOf(
  db: Database,
  authorization: string | undefined,
): Promise<TokenOwner | { refused: string }> {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(authorization ?? '');
  if (!match) return { refused: 'Send a valid access token as Authorization: Bearer <token>.' };
  const [row] = await db
    .select({
      tokenId: apiTokens.id,
      userId: apiTokens.userId,
      organisationId: apiTokens.organisationId,
      studyIds: apiTokens.studyIds,
      revokedAt: apiTokens.revokedAt,
      revokedReason: apiTokens.revokedReason,
      expiresAt: apiTokens.expiresAt,
      roles: memberships.roles,
      deactivatedAt: memberships.deactivatedAt,
    })
    .from(apiTokens)
    .leftJoin(
      memberships,
      and(
        eq(memberships.userId, apiTokens.userId),
        eq(memberships.organisationId, apiTokens.organisationId),
      ),
    )
    .where(eq(apiTokens.tokenHash, hashToken(match[1])));
  if (!row) return { refused: 'This access token is not known; check that it was copied whole.' };
  if (row.revokedAt) {
    const why = revokedBecause[row.revokedReason ?? 'owner'] ?? 'it was revoked';
    return { refused: `This access token was revoked on ${day(row.revokedAt)}: ${why}.` };
  }
  if (row.expiresAt.getTime() <= Date.now())
    return {
      refused: `This access token expired on ${day(row.expiresAt)}; issue a new one in the portal.`,
    };
  if (!row.roles || row.deactivatedAt || !row.roles.includes('client'))
    return { refused: 'The owner of this access token is no longer a client of the organisation.' };
  await db.update(apiTokens).set({ lastUsedAt: new Date() }).where(eq(apiTokens.id, row.tokenId));
  return {
    tokenId: row.tokenId,
    userId: row.userId,
    organisationId: row.organisationId,
    studyIds: row.studyIds,
  };
}

/**
 * Admits a request to a token route, recording the owner in `res.locals.tokenOwner`; answers
 * 401 without a valid token (403 when only a browser session came, which these routes refuse).
 */
export async function admitToken(db: Database, req: Request, res: Response): Promise<void> {
  const owner = await tokenOwnerOf(db, req.get('authorization'));
  if (!('refused' in owner)) {
    res.locals['tokenOwner'] = owner;
    return;
  }
  if (res.locals['actor'] && !req.get('authorization')) {
    throw forbidden(
      'The read API takes an access token (Authorization: Bearer …), not a browser session.',
    );
  }
  res.setHeader('WWW-Authenticate', 'Bearer realm="fieldcurve"');
  throw new HttpError(
    401,
    'not-signed-in',
    `${owner.refused} Tokens are issued and revoked in the portal.`,
  );
}

/** The token owner of a route the access policy admitted by token. */
export function tokenOwnerFrom(res: Response): TokenOwner {
  const owner = res.locals['tokenOwner'] as TokenOwner | undefined;
  if (!owner) throw new HttpError(401, 'not-signed-in', 'Send a valid access token.');
  return owner;
}
