import type { AccessRule } from '../auth/access-rule';

export const membersAccess: readonly AccessRule[] = [
  { method: 'GET', path: '/api/members', access: ['admin'] },
  { method: 'PUT', path: '/api/members/:userId/roles', access: ['admin'] },
  { method: 'POST', path: '/api/members/:userId/deactivate', access: ['admin'] },
  { method: 'POST', path: '/api/members/:userId/reactivate', access: ['admin'] },
  { method: 'GET', path: '/api/invitations', access: ['admin'] },
  { method: 'POST', path: '/api/invitations', access: ['admin'] },
  { method: 'DELETE', path: '/api/invitations/:invitationId', access: ['admin'] },
];
