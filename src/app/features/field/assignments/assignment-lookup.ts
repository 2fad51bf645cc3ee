import type {
  FieldAssignments,
  FieldQuestionnaireVersion,
  FieldStudy,
} from '@shared/field-sync/field-assignments';
import type { FieldRoute, RouteStop } from '@shared/routes/field-route';

/** A route of the assignments with its study. */
export interface RouteInStudy {
  readonly route: FieldRoute;
  readonly study: FieldStudy | null;
}

export function studyOf(assignments: FieldAssignments, studyId: string): FieldStudy | null {
  return assignments.studies.find((study) => study.id === studyId) ?? null;
}

export function routeOf(assignments: FieldAssignments, routeId: string): RouteInStudy | null {
  const route = assignments.routes.find((r) => r.id === routeId);
  return route ? { route, study: studyOf(assignments, route.studyId) } : null;
}

export function stopOf(route: FieldRoute, pointId: string): RouteStop | null {
  return route.stops.find((stop) => stop.pointId === pointId) ?? null;
}

/**
 * The questionnaires an interview at a study can be run with: the newest published version of
 * each of the study's questionnaires, newest first. Interviews record the version they used.
 */
export function runnableVersions(
  assignments: FieldAssignments,
  studyId: string,
): FieldQuestionnaireVersion[] {
  const newest = new Map<string, FieldQuestionnaireVersion>();
  for (const version of assignments.questionnaireVersions) {
    if (version.studyId !== studyId) continue;
    const held = newest.get(version.questionnaireId);
    if (!held || version.version > held.version) newest.set(version.questionnaireId, version);
  }
  return [...newest.values()].sort((a, b) => b.publishedAt.localeCompare(a.publishedAt));
}

export function versionOf(
  assignments: FieldAssignments,
  versionId: string,
): FieldQuestionnaireVersion | null {
  return assignments.questionnaireVersions.find((v) => v.id === versionId) ?? null;
}
