import { Injectable, inject } from '@angular/core';
import { liveQuery, type Observable as DexieObservable } from 'dexie';
import { from, type Observable } from 'rxjs';
import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import { FieldStore } from '../data/field-store';
import type { CachedAssignments } from '../data/field-records';
import { FieldSyncApi } from '../sync/field-sync-api';

/** The enumerator's routes, points and questionnaires as last fetched, kept for offline work. */
@Injectable({ providedIn: 'root' })
export class AssignmentsCache {
  private readonly store = inject(FieldStore);
  private readonly api = inject(FieldSyncApi);

  /** Asks the server and keeps the answer; rejects when the server cannot be reached. */
  async refresh(): Promise<FieldAssignments> {
    const payload = await this.api.assignments();
    await this.store.db.assignments.put({
      key: 'current',
      payload,
      fetchedAt: new Date().toISOString(),
    });
    return payload;
  }

  /** What the device holds, or null before the first online visit. */
  async read(): Promise<CachedAssignments | null> {
    return (await this.store.db.assignments.get('current')) ?? null;
  }

  /** The cached assignments, re-emitted whenever a refresh stores new ones. */
  watch(): Observable<CachedAssignments | null> {
    const db = this.store.db;
    const query: DexieObservable<CachedAssignments | null> = liveQuery(
      async () => (await db.assignments.get('current')) ?? null,
    );
    return from(query);
  }
}
