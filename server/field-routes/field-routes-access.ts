import type { AccessRule } from '../auth/access-rule';

const route = '/api/studies/:studyId/routes/:routeId';

/**
 * Supervisors plan and assign routes; researchers read them; enumerators read only the routes
 * assigned to them (the repository filters by the caller for them).
 */
export const fieldRoutesAccess: readonly AccessRule[] = [
  {
    method: 'GET',
    path: '/api/studies/:studyId/routes',
    access: ['supervisor', 'researcher', 'enumerator'],
    scope: 'study',
  },
  { method: 'POST', path: '/api/studies/:studyId/routes', access: ['supervisor'], scope: 'study' },
  {
    method: 'GET',
    path: route,
    access: ['supervisor', 'researcher', 'enumerator'],
    scope: 'study',
  },
  { method: 'PUT', path: route, access: ['supervisor'], scope: 'study' },
  { method: 'DELETE', path: route, access: ['supervisor'], scope: 'study' },
  { method: 'PUT', path: `${route}/assignment`, access: ['supervisor'], scope: 'study' },
  {
    method: 'GET',
    path: '/api/studies/:studyId/enumerators',
    access: ['supervisor', 'researcher'],
    scope: 'study',
  },
  {
    method: 'GET',
    path: '/api/studies/:studyId/progress',
    access: ['supervisor', 'researcher', 'enumerator'],
    scope: 'study',
  },
];
