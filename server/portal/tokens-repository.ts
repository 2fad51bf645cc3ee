import { and, desc, eq, isNull } from 'drizzle-orm';
import type { ApiToken, IssuedApiToken } from '@shared/analysis/api-token';
import { hashToken, newToken } from '../auth/bearer-token';
import type { Executor } from '../db/database';
import { apiTokens } from '../db/schema';
import { notFound } from '../http/http-error';

type Owner = { userId: string; organisationId: string };
type TokenRow = typeof apiTokens.$inferSelect;

function toToken(row: TokenRow): ApiToken {
  return {
    id: row.id,
    name: row.name,
    prefix: row.prefix,
    createdAt: row.createdAt.toISOString(),
    lastUsedAt: row.lastUsedAt?.toISOString() ?? null,
    revokedAt: row.revokedAt?.toISOString() ?? null,
  };
}

/** Issues a token; the secret is returned this once and only its hash is stored. */
export async function issueToken(
  db: Executor,
  owner: Owner,
  name: string,
): Promise<IssuedApiToken> {
  const token = newToken();
  const [row] = await db
    .insert(apiTokens)
    .values({ ...owner, name, tokenHash: hashToken(token), prefix: token.slice(0, 10) })
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

/** Revokes one of the owner's tokens at once; revoking twice changes nothing. */
export async function revokeToken(db: Executor, owner: Owner, tokenId: string): Promise<ApiToken> {
  const mine = and(
    eq(apiTokens.id, tokenId),
    eq(apiTokens.userId, owner.userId),
    eq(apiTokens.organisationId, owner.organisationId),
  );
  await db
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(mine, isNull(apiTokens.revokedAt)));
  const [row] = await db.select().from(apiTokens).where(mine);
  if (!row) throw notFound('That token');
  return toToken(row);
}
