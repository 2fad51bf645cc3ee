import { Injectable, inject } from '@angular/core';
import { liveQuery } from 'dexie';
import { from, type Observable } from 'rxjs';
import type { DraftInterview } from '../data/field-records';
import { FieldStore } from '../data/field-store';

/** What this device did at one point. */
export interface PointCounts {
  /** Finished interviews (sent or waiting), not counting those refused or rejected. */
  readonly done: number;
  readonly refusals: number;
  readonly inProgress: readonly DraftInterview[];
}

export const noCounts: PointCounts = { done: 0, refusals: 0, inProgress: [] };

/** Counts per point, live, from the device's own records (the server's may include others'). */
@Injectable({ providedIn: 'root' })
export class PointProgress {
  private readonly store = inject(FieldStore);

  watch(): Observable<ReadonlyMap<string, PointCounts>> {
    const db = this.store.db;
    return from(
      liveQuery(async () => {
        const counts = new Map<
          string,
          { done: number; refusals: number; inProgress: DraftInterview[] }
        >();
        const at = (pointId: string) => {
          let held = counts.get(pointId);
          if (!held) counts.set(pointId, (held = { done: 0, refusals: 0, inProgress: [] }));
          return held;
        };
        await db.outbox.each((entry) => {
          if (entry.state !== 'rejected') at(entry.pointId).done++;
        });
        await db.tallies.each((tally) => (at(tally.pointId).refusals = tally.refusals));
        await db.drafts.each((draft) => {
          if (!draft.returnedAt) at(draft.pointId).inProgress.push(draft);
        });
        return counts as ReadonlyMap<string, PointCounts>;
      }),
    );
  }
}
