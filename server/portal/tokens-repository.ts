import { and, desc, eq, isNull } from 'drizzle-orm';
import type {
  ApiToken,
  IssuedApiToken,
  OrganisationApiToken,
  TokenRevocationReason,
} from '@shared/analysis/api-token';
import { hashToken, newToken } from '../auth/bearer-token';
import type { Executor } from '../db/database';
import { apiTokens, users } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { clientStudyIds } from '../schedules/client-studies';

type Owner = { userId: string; organisationId: string };
type TokenRow = typeof apiTokens.$inferSelect;

const dayMs = 24 * 60 * 60 * 1000;

function toToken(row: TokenRow): ApiToken {
  return {
    id: row.id,
    name: row.name,
    prefix: row.prefix,
    createdAt: row.createdAt.toISOString(),
    lastUsedAt: row.lastUsedAt?.toISOString() ?? null,
    revokedAt: row.revokedAt?.toISOString() ?? null,
    revokedReason: row.revokedReason ?? null,
    expiresAt: row.expiresAt.toISOString(),
    studyIds: row.studyIds ?? null,
  };
}

/**
 * Issues a token; the secret is returned this once and only its hash is stored. A restriction
 * may name only studies the owner is a client of.
 */
export async function issueToken(
  db: Executor,
  owner: Owner,
  request: { name: string; expiresInDays: number; studyIds?: string[] },
): Promise<IssuedApiToken> {
  if (request.studyIds) {
    const own = new Set(await clientStudyIds(db, owner));
    const foreign = request.studyIds.flatMap((id, index) => (own.has(id) ? [] : [index]));
    if (foreign.length > 0) {
      throw new HttpError(
        400,
        'invalid-input',
        'A token can be restricted only to studies whose schedules you may read.',
        foreign.map((index) => ({
          path: `studyIds.${index}`,
          message: 'Not one of your studies',
        })),
      );
    }
  }
  const token = newToken();
  const [row] = await db
    .insert(apiTokens)
    .values({
      ...owner,
      name: request.name,
      tokenHash: hashToken(token),
      prefix: token.slice(0, 10),
      expiresAt: new Date(Date.now() + request.expiresInDays * dayMs),
      studyIds: request.studyIds ?? null,
    })
    .returning();
  return { ...toToken(row), token };
}

/** The owner's tokens, newest first, revoked ones included (marked). */
export async function listTokens(db: Executor, owner: Owner): Promise<ApiToken[]> {
  const rows = await db
    .select()
    .from(apiTokens)
    .where(
      and(eq(apiTokens.userId, owner.userId), eq(apiTokens.organisationId, owner.organisationId)),
    )
    .orderBy(desc(apiTokens.createdAt));
  return rows.map(toToken);
}

/** Every token of the organisation with its owner, newest first, for its admins. */
export async function listOrganisationTokens(
  db: Executor,
  organisationId: string,
): Promise<OrganisationApiToken[]> {
  const rows = await db
    .select({ token: apiTokens, ownerName: users.name, ownerEmail: users.email })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.userId))
    .where(eq(apiTokens.organisationId, organisationId))
    .orderBy(desc(apiTokens.createdAt));
  return rows.map((row) => ({
    ...toToken(row.token),
    ownerName: row.ownerName,
    ownerEmail: row.ownerEmail,
  }));
}

/**
 * Revokes one token at once: the owner's own (`userId` given) or, for an admin, any of the
 * organisation's. Revoking twice changes nothing.
 */
export async function revokeToken(
  db: Executor,
  scope: { organisationId: string; userId?: string },
  tokenId: string,
  reason: TokenRevocationReason,
): Promise<ApiToken> {
  const inScope = and(
    eq(apiTokens.id, tokenId),
    eq(apiTokens.organisationId, scope.organisationId),
    scope.userId ? eq(apiTokens.userId, scope.userId) : undefined,
  );
  await db
    .update(apiTokens)
    .set({ revokedAt: new Date(), revokedReason: reason })
    .where(and(inScope, isNull(apiTokens.revokedAt)));
  const [row] = await db.select().from(apiTokens).where(inScope);
  if (!row) throw notFound('That token');
  return toToken(row);
}
