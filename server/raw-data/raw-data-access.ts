import type { AccessRule } from '../auth/access-rule';

const base = '/api/studies/:studyId/raw-data';
const readers = ['researcher', 'supervisor'] as const;

/**
 * Researchers and supervisors of the study download its raw interviews and their dictionary.
 * Clients never see raw data, and enumerators work on their own interviews only.
 */
export const rawDataAccess: readonly AccessRule[] = [
  { method: 'GET', path: `${base}/interviews.csv`, access: readers, scope: 'study' },
  { method: 'GET', path: `${base}/interviews.xlsx`, access: readers, scope: 'study' },
  { method: 'GET', path: `${base}/dictionary.json`, access: readers, scope: 'study' },
];
