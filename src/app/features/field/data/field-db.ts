import Dexie, { type EntityTable } from 'dexie';
import type {
  CachedAssignments,
  DraftInterview,
  MetaEntry,
  OutboxEntry,
  PointTally,
  StoredNotice,
  StoredPhoto,
  SyncLogEntry,
} from './field-records';

/**
 * The enumerator's work on this device, in IndexedDB. One database per person, so a phone
 * handed to a colleague never mixes (or sends) two people's interviews.
 */
export class FieldDb extends Dexie {
  readonly assignments!: EntityTable<CachedAssignments, 'key'>;
  readonly drafts!: EntityTable<DraftInterview, 'id'>;
  readonly outbox!: EntityTable<OutboxEntry, 'id'>;
  readonly photos!: EntityTable<StoredPhoto, 'id'>;
  readonly syncLog!: EntityTable<SyncLogEntry, 'id'>;
  readonly notices!: EntityTable<StoredNotice, 'interviewId'>;
  readonly tallies!: EntityTable<PointTally, 'pointId'>;
  readonly meta!: EntityTable<MetaEntry, 'key'>;

  constructor(userId: string) {
    super(fieldDbName(userId));
    this.version(1).stores({
      assignments: 'key',
      drafts: 'id, pointId, updatedAt',
      outbox: 'id, state, pointId, queuedAt',
      photos: 'id, interviewId',
      syncLog: '++id, at',
      notices: 'interviewId',
      tallies: 'pointId',
      meta: 'key',
    });
  }
}

export function fieldDbName(userId: string): string {
  return `fieldcurve-field-${userId}`;
}
