import type { AccessRule } from '../auth/access-rule';

const readers = ['researcher', 'supervisor', 'enumerator'] as const;
const base = '/api/studies/:studyId/questionnaires';

/**
 * Researchers write questionnaires; supervisors and enumerators read published versions of
 * their studies' questionnaires (the repository hides drafts from them); clients see none.
 */
export const questionnairesAccess: readonly AccessRule[] = [
  { method: 'GET', path: base, access: readers, scope: 'study' },
  { method: 'POST', path: base, access: ['researcher'], scope: 'study' },
  { method: 'GET', path: `${base}/:questionnaireId`, access: readers, scope: 'study' },
  { method: 'PUT', path: `${base}/:questionnaireId/draft`, access: ['researcher'], scope: 'study' },
  {
    method: 'POST',
    path: `${base}/:questionnaireId/new-draft`,
    access: ['researcher'],
    scope: 'study',
  },
  {
    method: 'GET',
    path: `${base}/:questionnaireId/versions/:version`,
    access: readers,
    scope: 'study',
  },
  {
    method: 'PUT',
    path: `${base}/:questionnaireId/versions/:version`,
    access: ['researcher'],
    scope: 'study',
  },
  {
    method: 'POST',
    path: `${base}/:questionnaireId/versions/:version/publish`,
    access: ['researcher'],
    scope: 'study',
  },
];
