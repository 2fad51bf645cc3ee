import type { AccessRule } from '../auth/access-rule';

/**
 * The read API for clients' own planning tools: published schedules of the token owner's
 * studies, by access token; its OpenAPI document is public.
 */
export const readApiAccess: readonly AccessRule[] = [
  { method: 'GET', path: '/api/v1/openapi.json', access: 'public' },
  { method: 'GET', path: '/api/v1/schedules', access: 'token' },
  { method: 'GET', path: '/api/v1/schedules/:versionId.csv', access: 'token' },
  { method: 'GET', path: '/api/v1/schedules/:versionId', access: 'token' },
];
