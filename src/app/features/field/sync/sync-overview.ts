import { Injectable, inject } from '@angular/core';
import { liveQuery } from 'dexie';
import { from, type Observable } from 'rxjs';
import { FieldStore } from '../data/field-store';
import type { OutboxEntry, SyncLogEntry } from '../data/field-records';
import { lastSyncKey } from './outbox-sync';

/** What the sync status and the sync page show, read live from the device's database. */
export interface SyncOverview {
  readonly waitingInterviews: number;
  /** Finished interviews not yet complete on the server: waiting, or their photos are. */
  readonly unsent: number;
  readonly waitingPhotos: number;
  readonly inProgress: number;
  readonly lastSuccessAt: string | null;
  /** Refused by the server, or rejected by a supervisor. */
  readonly rejected: readonly OutboxEntry[];
  /** Returned by a supervisor for correction, and not yet corrected. */
  readonly returned: readonly OutboxEntry[];
  /** Ids of returned interviews being corrected right now (a draft exists). */
  readonly correcting: readonly string[];
  readonly log: readonly SyncLogEntry[];
}

@Injectable({ providedIn: 'root' })
export class SyncOverviewSource {
  private readonly store = inject(FieldStore);

  watch(): Observable<SyncOverview> {
    const db = this.store.db;
    return from(
      liveQuery(async (): Promise<SyncOverview> => {
        const waitingInterviews = await db.outbox.where('state').equals('waiting').count();
        const unsent = await db.outbox.where('state').anyOf('waiting', 'photos').count();
        const drafts = await db.drafts.toArray();
        const draftIds = new Set(drafts.map((draft) => draft.id));
        // Photos of an interview still being run are not waiting for the sync yet.
        const waitingPhotos = await db.photos
          .filter((photo) => !photo.storedAt && !draftIds.has(photo.interviewId))
          .count();
        const rejected = await db.outbox.where('state').equals('rejected').toArray();
        const returned = await db.outbox.where('state').equals('returned').toArray();
        const last = await db.meta.get(lastSyncKey);
        const log = await db.syncLog.orderBy('id').reverse().limit(20).toArray();
        return {
          waitingInterviews,
          unsent,
          waitingPhotos,
          inProgress: drafts.filter((draft) => !draft.returnedAt).length,
          lastSuccessAt: last?.value ?? null,
          rejected,
          returned,
          correcting: drafts.filter((draft) => draft.returnedAt).map((draft) => draft.id),
          log,
        };
      }),
    );
  }
}
