import type { AccessRule } from '../auth/access-rule';

const researcher = { access: ['researcher'] as const, scope: 'study' as const };

/** Researchers of the study bring datasets in, fit them, and delete them. */
export const datasetsAccess: readonly AccessRule[] = [
  { method: 'POST', path: '/api/studies/:studyId/dataset-uploads', ...researcher },
  { method: 'GET', path: '/api/studies/:studyId/dataset-uploads/:uploadId', ...researcher },
  { method: 'PUT', path: '/api/studies/:studyId/dataset-uploads/:uploadId', ...researcher },
  { method: 'GET', path: '/api/studies/:studyId/dataset-uploads/:uploadId/preview', ...researcher },
  { method: 'POST', path: '/api/studies/:studyId/datasets', ...researcher },
  { method: 'GET', path: '/api/studies/:studyId/datasets', ...researcher },
  { method: 'GET', path: '/api/studies/:studyId/datasets/:datasetId', ...researcher },
  { method: 'DELETE', path: '/api/studies/:studyId/datasets/:datasetId', ...researcher },
  { method: 'POST', path: '/api/studies/:studyId/datasets/:datasetId/fits', ...researcher },
  { method: 'GET', path: '/api/studies/:studyId/datasets/:datasetId/fits', ...researcher },
  { method: 'GET', path: '/api/studies/:studyId/dataset-fits/:fitId', ...researcher },
];
