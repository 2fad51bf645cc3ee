import type { AccessRule } from '../auth/access-rule';

const version = '/api/studies/:studyId/schedules/:versionId';
const readers = ['researcher', 'client'] as const;

/**
 * Researchers publish; researchers and the study's clients read and download. Every version is
 * published (drafts are fits, which clients never see).
 */
export const schedulesAccess: readonly AccessRule[] = [
  {
    method: 'POST',
    path: '/api/studies/:studyId/schedules',
    access: ['researcher'],
    scope: 'study',
  },
  { method: 'GET', path: '/api/studies/:studyId/schedules', access: readers, scope: 'study' },
  { method: 'GET', path: version, access: readers, scope: 'study' },
  { method: 'GET', path: `${version}/download.csv`, access: readers, scope: 'study' },
  { method: 'GET', path: `${version}/download.xlsx`, access: readers, scope: 'study' },
  { method: 'GET', path: `${version}/download.pdf`, access: readers, scope: 'study' },
  { method: 'GET', path: '/api/portal/schedules', access: ['client'] },
];
