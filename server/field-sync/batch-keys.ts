const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The ids and keys a batch's lookups need, read loosely before each item is checked. */
export interface BatchKeys {
  interviewIds: string[];
  versionIds: string[];
  photoIds: string[];
  /** Each item's (study, respondent key) pair, for the same-respondent check. */
  respondents: RespondentSlotKey[];
}

/** A respondent within a study, as the batch names it. */
export interface RespondentSlotKey {
  studyId: string;
  respondentKey: string;
}

const uuidAt = (record: Record<string, unknown>, key: string): string[] => {
  const value = record[key];
  return typeof value === 'string' && uuidPattern.test(value) ? [value] : [];
};

/**
 * Collects, from items not yet checked, every well-formed id to look up in one query each.
 * Malformed values are left out (PostgreSQL would refuse them as uuids); the item's own check
 * reports them.
 */
export function batchKeys(items: readonly unknown[]): BatchKeys {
  const keys: BatchKeys = {
    interviewIds: [],
    versionIds: [],
    photoIds: [],
    respondents: [],
  };
  for (const item of items) {
    if (item === null || typeof item !== 'object') continue;
    const record = item as Record<string, unknown>;
    keys.interviewIds.push(...uuidAt(record, 'id'));
    keys.versionIds.push(...uuidAt(record, 'questionnaireVersionId'));
    const [studyId] = uuidAt(record, 'studyId');
    const respondentKey = record['respondentKey'];
    if (studyId !== undefined && typeof respondentKey === 'string')
      keys.respondents.push({ studyId, respondentKey });
    if (Array.isArray(record['photos'])) {
      for (const photo of record['photos'] as unknown[]) {
        if (photo !== null && typeof photo === 'object') {
          keys.photoIds.push(...uuidAt(photo as Record<string, unknown>, 'photoId'));
        }
      }
    }
  }
  return keys;
}
