import type { AccessRule } from '../auth/access-rule';

/**
 * Clients issue, list and revoke their own read-API tokens in the portal; admins see and revoke
 * every token of the organisation.
 */
export const tokensAccess: readonly AccessRule[] = [
  { method: 'POST', path: '/api/portal/tokens', access: ['client'] },
  { method: 'GET', path: '/api/portal/tokens', access: ['client'] },
  { method: 'DELETE', path: '/api/portal/tokens/:tokenId', access: ['client'] },
  { method: 'GET', path: '/api/admin/tokens', access: ['admin'] },
  { method: 'DELETE', path: '/api/admin/tokens/:tokenId', access: ['admin'] },
];
