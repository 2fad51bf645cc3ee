import type { GpsFix } from '@shared/field-sync/field-interview';
import type { PhotoManifestEntry } from '@shared/field-sync/photo-manifest';

/**
 * What makes two submissions of an interview the same: everything the device decides. Built the
 * same way from a synced record and from a stored row, so a replay compares equal.
 */
export interface InterviewContent {
  studyId: string;
  questionnaireVersionId: string;
  routeId: string | null;
  pointId: string | null;
  startedAt: number;
  finishedAt: number;
  answers: unknown;
  fix: GpsFix | null;
  respondentKey: string | null;
  photos: readonly PhotoManifestEntry[];
}

/** JSON with object keys sorted at every level, so key order never makes a difference. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** A comparable fingerprint of an interview's content (photos in id order). */
export function contentFingerprint(content: InterviewContent): string {
  const photos = [...content.photos].sort((a, b) => (a.photoId < b.photoId ? -1 : 1));
  return canonicalJson({ ...content, photos });
}
