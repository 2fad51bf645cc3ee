/** The fields of a synced interview that hold UUIDs, and the one inside each declared photo. */
const idFields = ['id', 'studyId', 'questionnaireVersionId', 'routeId', 'pointId'] as const;

const lower = (value: unknown) => (typeof value === 'string' ? value.toLowerCase() : value);

/**
 * An interview item as sent, with its ids in lower case. A UUID's case carries no meaning and
 * PostgreSQL ignores it, but the batch's own checks compare ids as text: `ABC…` and `abc…` must
 * be one interview there too (a repeat, a duplicate), never two. Anything not an object is
 * left for the item's check to refuse.
 */
export function withLowerCaseIds(item: unknown): unknown {
  if (typeof item !== 'object' || item === null || Array.isArray(item)) return item;
  const record = { ...(item as Record<string, unknown>) };
  for (const field of idFields) if (field in record) record[field] = lower(record[field]);
  if (Array.isArray(record['photos'])) {
    record['photos'] = record['photos'].map((photo: unknown) =>
      typeof photo === 'object' && photo !== null && !Array.isArray(photo) && 'photoId' in photo
        ? { ...photo, photoId: lower((photo as { photoId: unknown }).photoId) }
        : photo,
    );
  }
  return record;
}
