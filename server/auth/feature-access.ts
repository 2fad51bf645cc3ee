import type { AccessRule } from './access-rule';
import { fieldRoutesAccess } from '../field-routes/field-routes-access';
import { fieldSyncAccess } from '../field-sync/field-sync-access';
import { questionnairesAccess } from '../questionnaires/questionnaires-access';
import { samplingAccess } from '../sampling/sampling-access';
import { studiesAccess } from '../studies/studies-access';
import { analysisAccess } from '../fits/analysis-access';
import { datasetsAccess } from '../datasets/datasets-access';
import { rawDataAccess } from '../raw-data/raw-data-access';

/**
 * Access rules of the study features (studies, questionnaires, sampling points, routes, field
 * sync, analysis). Each feature folder exports its own list; this file gathers them.
 */
export const featureAccess: readonly AccessRule[] = [
  ...studiesAccess,
  ...questionnairesAccess,
  ...samplingAccess,
  ...fieldRoutesAccess,
  ...fieldSyncAccess,
  ...analysisAccess,
  ...datasetsAccess,
  ...rawDataAccess,
];
