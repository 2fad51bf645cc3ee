import type { ApiToken } from './api-token';

const revokedWords: Readonly<Record<string, string>> = {
  owner: 'revoked by its owner',
  admin: 'revoked by an administrator',
  'role-removed': 'revoked: the owner lost the client role',
  'member-deactivated': 'revoked: the owner was deactivated',
};

/** Whether a token still works, in words for the lists (`now` for tests). */
export function tokenStatus(
  token: Pick<ApiToken, 'revokedAt' | 'revokedReason' | 'expiresAt'>,
  now = Date.now(),
): { live: boolean; words: string } {
  if (token.revokedAt)
    return { live: false, words: revokedWords[token.revokedReason ?? 'owner'] ?? 'revoked' };
  if (Date.parse(token.expiresAt) <= now) return { live: false, words: 'expired' };
  return { live: true, words: 'active' };
}
