import type { AccessRule } from '../auth/access-rule';

const everyStudyRole = ['researcher', 'supervisor', 'enumerator', 'client'] as const;

/** Researchers create and run studies; every member may read the study itself. */
export const studiesAccess: readonly AccessRule[] = [
  { method: 'GET', path: '/api/studies', access: 'signed-in' },
  { method: 'POST', path: '/api/studies', access: ['researcher'] },
  { method: 'GET', path: '/api/studies/:studyId', access: everyStudyRole, scope: 'study' },
  { method: 'PATCH', path: '/api/studies/:studyId', access: ['researcher'], scope: 'study' },
  { method: 'POST', path: '/api/studies/:studyId/status', access: ['researcher'], scope: 'study' },
  {
    method: 'GET',
    path: '/api/studies/:studyId/members',
    access: ['researcher', 'supervisor'],
    scope: 'study',
  },
  {
    method: 'GET',
    path: '/api/studies/:studyId/member-candidates',
    access: ['researcher'],
    scope: 'study',
  },
  {
    method: 'PUT',
    path: '/api/studies/:studyId/members/:userId',
    access: ['researcher'],
    scope: 'study',
  },
  {
    method: 'DELETE',
    path: '/api/studies/:studyId/members/:userId',
    access: ['researcher'],
    scope: 'study',
  },
];
