import { DestroyRef, Injectable, inject, signal } from '@angular/core';
import {
  EMPTY,
  Subject,
  catchError,
  defer,
  exhaustMap,
  fromEvent,
  map,
  merge,
  race,
  retry,
  throwError,
  timer,
  type Observable,
  type Subscription,
} from 'rxjs';
import { AssignmentsCache } from '../assignments/assignments-cache';
import { FieldStore } from '../data/field-store';
import { NoticeIntake } from './notice-intake';
import { OutboxSender } from './outbox-sender';
import { PhotoUploader } from './photo-uploader';
import { retryDelayMs } from './retry-delay';
import { describeSyncFailure, isTransientFailure } from './sync-failure';
import { SYNC_SETTINGS } from './sync-settings';

export type SyncPhase = 'idle' | 'syncing' | 'offline' | 'retrying' | 'failed';

export const lastSyncKey = 'lastSuccessfulSync';

/**
 * Drives the sync: when the browser comes online, when the enumerator asks, and every few
 * minutes. A run sends the outbox in batches, uploads photos, fetches the supervisors' notices
 * and refreshes the assignments. A run that fails for a passing reason is retried with
 * exponential backoff and jitter; "Sync now" or the network coming back cuts the wait short.
 */
@Injectable({ providedIn: 'root' })
export class OutboxSync {
  private readonly store = inject(FieldStore);
  private readonly sender = inject(OutboxSender);
  private readonly uploader = inject(PhotoUploader);
  private readonly notices = inject(NoticeIntake);
  private readonly assignments = inject(AssignmentsCache);
  private readonly settings = inject(SYNC_SETTINGS);
  private readonly requests = new Subject<void>();
  private readonly phaseState = signal<SyncPhase>('idle');
  private readonly problemState = signal<string | null>(null);
  private readonly retryAtState = signal<number | null>(null);
  private running: Subscription | null = null;

  readonly phase = this.phaseState.asReadonly();
  readonly problem = this.problemState.asReadonly();
  /** When the next automatic try is due after a failure (epoch ms), or null. */
  readonly retryAt = this.retryAtState.asReadonly();

  constructor() {
    inject(DestroyRef).onDestroy(() => this.running?.unsubscribe());
  }

  /** Starts watching for chances to sync; calling it again does nothing. */
  start(): void {
    if (this.running) return;
    const online$ = fromEvent(window, 'online').pipe(map((): void => undefined));
    const triggers = merge(this.requests, online$, timer(0, this.settings.periodMs));
    this.running = triggers.pipe(exhaustMap(() => this.runWithRetries(online$))).subscribe();
  }

  /** The "Sync now" button. */
  syncNow(): void {
    this.start();
    this.requests.next();
  }

  private runWithRetries(online$: Observable<void>): Observable<void> {
    if (globalThis.navigator?.onLine === false) {
      this.phaseState.set('offline');
      return EMPTY;
    }
    return defer(() => this.runOnce()).pipe(
      retry({
        resetOnSuccess: true,
        delay: (error: unknown, failures: number) => {
          if (!isTransientFailure(error)) return throwError(() => error);
          const wait = retryDelayMs(failures, this.settings.retry, this.settings.random);
          this.phaseState.set('retrying');
          this.problemState.set(describeSyncFailure(error));
          this.retryAtState.set(Date.now() + wait);
          return race(timer(wait), this.requests, online$);
        },
      }),
      catchError((error: unknown) => {
        this.phaseState.set('failed');
        this.problemState.set(describeSyncFailure(error));
        this.retryAtState.set(null);
        void this.store.log(false, describeSyncFailure(error)).catch(() => undefined);
        return EMPTY;
      }),
    );
  }

  private async runOnce(): Promise<void> {
    this.phaseState.set('syncing');
    const sent = await this.sender.drain();
    const photos = await this.uploader.uploadPending();
    await this.notices.fetch();
    await this.assignments.refresh();
    const at = new Date().toISOString();
    await this.store.db.meta.put({ key: lastSyncKey, value: at });
    if (sent.batches > 0 || photos > 0) {
      await this.store.log(true, summarise(sent.accepted + sent.duplicate, sent.rejected, photos));
    }
    this.phaseState.set('idle');
    this.problemState.set(null);
    this.retryAtState.set(null);
  }
}

function summarise(stored: number, refused: number, photos: number): string {
  const parts = [`${stored} interview${stored === 1 ? '' : 's'} stored`];
  if (refused > 0) parts.push(`${refused} refused`);
  if (photos > 0) parts.push(`${photos} photo${photos === 1 ? '' : 's'} uploaded`);
  return `${parts.join(', ')}.`;
}
