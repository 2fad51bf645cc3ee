import { createHash, randomBytes } from 'node:crypto';
import { and, eq, isNull } from 'drizzle-orm';
import type { Request, Response } from 'express';
import type { Database } from '../db/database';
import { apiTokens, memberships } from '../db/schema';
import { forbidden, HttpError } from '../http/http-error';

/** Who a read-API token acts for. */
export interface TokenOwner {
  tokenId: string;
  userId: string;
  organisationId: string;
}

/** Tokens are stored only as their SHA-256; a leaked table reveals no token. */
export const hashToken = (token: string) =>
  createHash('sha256').update(token, 'utf8').digest('hex');

/** A new token: a recognisable prefix and 32 random bytes. */
export function newToken(): string {
  return `fct_${randomBytes(32).toString('base64url')}`;
}

/**
 * The owner of the token in an `Authorization: Bearer …` header, or undefined when there is no
 * such header, the token is unknown or revoked, or its owner has left the organisation.
 */
export async function tokenOwnerOf(
  db: Database,
  authorization: string | undefined,
): Promise<TokenOwner | undefined> {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(authorization ?? '');
  if (!match) return undefined;
  const [row] = await db
    .select({
      tokenId: apiTokens.id,
      userId: apiTokens.userId,
      organisationId: apiTokens.organisationId,
    })
    .from(apiTokens)
    .innerJoin(
      memberships,
      and(
        eq(memberships.userId, apiTokens.userId),
        eq(memberships.organisationId, apiTokens.organisationId),
      ),
    )
    .where(and(eq(apiTokens.tokenHash, hashToken(match[1])), isNull(apiTokens.revokedAt)));
  if (!row) return undefined;
  await db.update(apiTokens).set({ lastUsedAt: new Date() }).where(eq(apiTokens.id, row.tokenId));
  return row;
}

/**
 * Admits a request to a token route, recording the owner in `res.locals.tokenOwner`; answers
 * 401 without a valid token (403 when only a browser session came, which these routes refuse).
 */
export async function admitToken(db: Database, req: Request, res: Response): Promise<void> {
  const owner = await tokenOwnerOf(db, req.get('authorization'));
  if (owner) {
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
    'Send a valid access token as Authorization: Bearer <token>; tokens are issued and revoked in the portal.',
  );
}

/** The token owner of a route the access policy admitted by token. */
export function tokenOwnerFrom(res: Response): TokenOwner {
  const owner = res.locals['tokenOwner'] as TokenOwner | undefined;
  if (!owner) throw new HttpError(401, 'not-signed-in', 'Send a valid access token.');
  return owner;
}
