/**
 * Where the client's portal shows a published schedule; the e-mail announcing a version links
 * here, so the portal's routes must keep this shape.
 */
export function portalSchedulePath(studyId: string, versionId: string): string {
  return `/reports/${studyId}/schedules/${versionId}`;
}

/** The OpenAPI document of the read API clients' own tools call. */
export const readApiDocumentPath = '/api/v1/openapi.json';
