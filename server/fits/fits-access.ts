import type { AccessRule } from '../auth/access-rule';

/** Researchers of the study run and read fits; nobody else sees unpublished analysis. */
export const fitsAccess: readonly AccessRule[] = [
  { method: 'POST', path: '/api/studies/:studyId/fits', access: ['researcher'], scope: 'study' },
  { method: 'GET', path: '/api/studies/:studyId/fits', access: ['researcher'], scope: 'study' },
  {
    method: 'GET',
    path: '/api/studies/:studyId/fits/:fitId',
    access: ['researcher'],
    scope: 'study',
  },
];
