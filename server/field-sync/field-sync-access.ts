import type { AccessRule } from '../auth/access-rule';

const interview = '/api/studies/:studyId/interviews/:interviewId';

/**
 * The enumerator's device syncs through `/api/field/*`: only their own routes, interviews and
 * photos are reachable there (the queries filter by the caller). Supervisors review a study's
 * interviews; researchers may read the queue and the interviews but not decide on them.
 */
export const fieldSyncAccess: readonly AccessRule[] = [
  { method: 'GET', path: '/api/field/assignments', access: ['enumerator'] },
  { method: 'POST', path: '/api/field/sync', access: ['enumerator'] },
  { method: 'GET', path: '/api/field/notices', access: ['enumerator'] },
  // HEAD is answered by the GET rule (see the access guard).
  { method: 'GET', path: '/api/field/photos/:photoId', access: ['enumerator'] },
  { method: 'PUT', path: '/api/field/photos/:photoId', access: ['enumerator'] },
  {
    method: 'GET',
    path: '/api/studies/:studyId/review',
    access: ['supervisor', 'researcher'],
    scope: 'study',
  },
  {
    method: 'GET',
    path: '/api/studies/:studyId/review/facets',
    access: ['supervisor', 'researcher'],
    scope: 'study',
  },
  {
    method: 'POST',
    path: '/api/studies/:studyId/review/accept',
    access: ['supervisor'],
    scope: 'study',
  },
  { method: 'GET', path: '/api/review/pending', access: 'signed-in' },
  { method: 'GET', path: interview, access: ['supervisor', 'researcher'], scope: 'study' },
  {
    method: 'GET',
    path: `${interview}/photos/:photoId`,
    access: ['supervisor', 'researcher'],
    scope: 'study',
  },
  { method: 'POST', path: `${interview}/review`, access: ['supervisor'], scope: 'study' },
  // Admins see every study's devices, supervisors their studies' (checked in the router).
  { method: 'GET', path: '/api/studies/:studyId/devices', access: ['admin', 'supervisor'] },
  {
    method: 'POST',
    path: '/api/studies/:studyId/devices/:deviceId/sign-out',
    access: ['admin', 'supervisor'],
  },
];
