import { Injectable, inject } from '@angular/core';
import type { FieldNotice } from '@shared/field-sync/field-notice';
import type { FieldDb } from '../data/field-db';
import type { OutboxEntry } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { FieldSyncApi } from './field-sync-api';

/**
 * Brings the supervisors' returns and rejections onto the device: each marks its interview in
 * the outbox with the note, so the sync page lists it and a returned one can be corrected. An
 * interview the device does not hold (sent from another device) is added from the notice.
 */
@Injectable({ providedIn: 'root' })
export class NoticeIntake {
  private readonly store = inject(FieldStore);
  private readonly api = inject(FieldSyncApi);

  async fetch(): Promise<number> {
    const notices = await this.api.notices();
    await applyNotices(this.store.db, notices);
    return notices.length;
  }
}

export async function applyNotices(db: FieldDb, notices: readonly FieldNotice[]): Promise<void> {
  await db.transaction('rw', db.notices, db.outbox, db.drafts, async () => {
    await db.notices.clear();
    await db.notices.bulkPut([...notices]);
    for (const notice of notices) {
      const entry = await db.outbox.get(notice.interviewId);
      // Already corrected and queued again in answer to this very return: nothing to show.
      if (entry && entry.interview.returnedAt === notice.reviewedAt) continue;
      if (entry?.state === notice.status && entry.reason === notice.note) continue;
      await db.outbox.put(markedBy(notice, entry));
    }
  });
}

function markedBy(notice: FieldNotice, entry: OutboxEntry | undefined): OutboxEntry {
  const base: OutboxEntry = entry ?? {
    id: notice.interviewId,
    interview: {
      id: notice.interviewId,
      studyId: notice.studyId,
      questionnaireVersionId: notice.questionnaireVersionId,
      routeId: notice.routeId ?? '',
      pointId: notice.pointId ?? '',
      startedAt: notice.startedAt,
      finishedAt: notice.finishedAt,
      answers: notice.answers,
      photos: notice.photos,
      ...(notice.gps ? { gps: notice.gps } : {}),
    },
    pointId: notice.pointId ?? '',
    routeId: notice.routeId ?? '',
    state: notice.status,
    queuedAt: notice.finishedAt,
    answeredAt: null,
    serverStatus: notice.status,
    reason: null,
    issues: [],
  };
  return { ...base, state: notice.status, serverStatus: notice.status, reason: notice.note };
}
