import type { AccessRule } from '../auth/access-rule';

/** Supervisors plan the sampling frame; researchers read it. */
export const samplingAccess: readonly AccessRule[] = [
  {
    method: 'GET',
    path: '/api/studies/:studyId/sampling-points',
    access: ['supervisor', 'researcher'],
    scope: 'study',
  },
  {
    method: 'POST',
    path: '/api/studies/:studyId/sampling-points/import',
    access: ['supervisor'],
    scope: 'study',
  },
];
