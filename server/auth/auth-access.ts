import type { AccessRule } from './access-rule';

export const authAccess: readonly AccessRule[] = [
  { method: 'GET', path: '/api/session', access: 'signed-in' },
  { method: 'POST', path: '/api/session/sign-out-everywhere', access: 'signed-in' },
];
