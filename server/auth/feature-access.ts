import type { AccessRule } from './access-rule';

/**
 * Access rules of the study features (studies, questionnaires, sampling points, routes, field
 * sync, analysis). Each feature folder exports its own list; this file gathers them.
 */
export const featureAccess: readonly AccessRule[] = [];
