import type { AccessRule } from '../auth/access-rule';

export const healthAccess: readonly AccessRule[] = [
  { method: 'GET', path: '/api/health', access: 'public' },
  { method: 'GET', path: '/api/health/details', access: ['admin'] },
];
