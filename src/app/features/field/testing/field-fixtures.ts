import type { FieldQuestionnaireVersion } from '@shared/field-sync/field-assignments';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { Block } from '@shared/questionnaire/block';
import type { SyncItemResult } from '@shared/field-sync/sync-batch';
import type { OutboxEntry } from '../data/field-records';

export const studyId = '5b0c7a52-4d7e-4b7a-9c1e-2f3a4b5c6d70';
export const routeId = '6c1d8b63-5e8f-4c8b-8d2f-3a4b5c6d7e81';
export const pointId = '7d2e9c74-6f90-4d9c-9e3a-4b5c6d7e8f92';
export const versionId = '8e3fad85-7a01-4eac-8f4b-5c6d7e8f9aa3';

/** The published questionnaire version `versionId` of `studyId`, with these blocks. */
export function fieldVersion(blocks: Block[]): FieldQuestionnaireVersion {
  return {
    id: versionId,
    questionnaireId: crypto.randomUUID(),
    studyId,
    title: 'Lamp survey',
    version: 1,
    publishedAt: '2027-03-01T08:00:00Z',
    definition: { blocks },
  };
}

/** A finished interview in the outbox, queued `minute` minutes into an invented day. */
export function outboxEntry(minute: number, photoIds: string[] = []): OutboxEntry {
  const id = crypto.randomUUID();
  const at = new Date(Date.UTC(2027, 2, 1, 9, minute)).toISOString();
  const interview: FieldInterview = {
    id,
    studyId,
    questionnaireVersionId: versionId,
    routeId,
    pointId,
    startedAt: at,
    finishedAt: at,
    answers: { consent: { agreed: true } },
    photos: photoIds.map((photoId) => ({
      photoId,
      sha256: 'a'.repeat(64),
      byteSize: 600_000,
      contentType: 'image/jpeg',
    })),
  };
  return {
    id,
    interview,
    pointId,
    routeId,
    state: 'waiting',
    queuedAt: at,
    answeredAt: null,
    serverStatus: null,
    reason: null,
    issues: [],
  };
}

export function accepted(index: number, id: string): SyncItemResult {
  return { index, id, outcome: 'accepted', status: 'received', resubmitted: false };
}
