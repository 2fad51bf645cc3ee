import { HttpErrorResponse } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { AssignmentsCache } from '../assignments/assignments-cache';
import { FieldStore } from '../data/field-store';
import { NoticeIntake } from './notice-intake';
import { OutboxSender } from './outbox-sender';
import { OutboxSync } from './outbox-sync';
import { PhotoUploader } from './photo-uploader';
import { SYNC_SETTINGS } from './sync-settings';

const noNetwork = () => new HttpErrorResponse({ status: 0, statusText: 'Unknown Error' });
const emptyDrain = { batches: 0, accepted: 0, duplicate: 0, rejected: 0 };

describe('OutboxSync', () => {
  let sync: OutboxSync;
  let attemptsAt: number[];
  let failures: unknown[];

  beforeEach(() => {
    vi.useFakeTimers();
    vi.setSystemTime(0);
    attemptsAt = [];
    failures = [];
    const drain = () => {
      attemptsAt.push(Date.now());
      const failure = failures.shift();
      return failure ? Promise.reject(failure as Error) : Promise.resolve(emptyDrain);
    };
    TestBed.configureTestingModule({
      providers: [
        { provide: OutboxSender, useValue: { drain } },
        { provide: PhotoUploader, useValue: { uploadPending: () => Promise.resolve(0) } },
        { provide: NoticeIntake, useValue: { fetch: () => Promise.resolve(0) } },
        { provide: AssignmentsCache, useValue: { refresh: () => Promise.resolve() } },
        {
          provide: FieldStore,
          useValue: {
            db: { meta: { put: () => Promise.resolve() } },
            log: () => Promise.resolve(),
          },
        },
        {
          provide: SYNC_SETTINGS,
          // Jitter fixed at one half: each wait is half of its exponential ceiling.
          useValue: {
            periodMs: 3_600_000,
            retry: { baseMs: 1000, maxMs: 60_000 },
            random: () => 0.5,
          },
        },
      ],
    });
    sync = TestBed.inject(OutboxSync);
  });

  afterEach(() => {
    TestBed.resetTestingModule();
    vi.useRealTimers();
  });

  it('retries a run that found no network after growing, jittered waits', async () => {
    failures = [noNetwork(), noNetwork(), noNetwork()];
    sync.start();
    await vi.advanceTimersByTimeAsync(10_000);
    // Waits of 0.5 × 1 s, 0.5 × 2 s and 0.5 × 4 s after the first, second and third failure.
    expect(attemptsAt).toEqual([0, 500, 1500, 3500]);
    expect(sync.phase()).toBe('idle');
    expect(sync.problem()).toBeNull();
  });

  it('shows that it is waiting to retry, and when', async () => {
    failures = [noNetwork()];
    sync.start();
    await vi.advanceTimersByTimeAsync(100);
    expect(sync.phase()).toBe('retrying');
    expect(sync.problem()).toBe('No connection to the server.');
    expect(sync.retryAt()).toBe(500);
  });

  it('does not retry a refusal that waiting will not change', async () => {
    failures = [new HttpErrorResponse({ status: 403, statusText: 'Forbidden' })];
    sync.start();
    await vi.advanceTimersByTimeAsync(120_000);
    expect(attemptsAt).toEqual([0]);
    expect(sync.phase()).toBe('failed');
  });

  it('cuts the wait short when the enumerator asks to sync now', async () => {
    failures = [noNetwork(), noNetwork()];
    sync.start();
    await vi.advanceTimersByTimeAsync(100);
    sync.syncNow();
    await vi.advanceTimersByTimeAsync(0);
    expect(attemptsAt).toEqual([0, 100]);
  });

  it('tries again as soon as the browser reports the network back', async () => {
    failures = [noNetwork()];
    sync.start();
    await vi.advanceTimersByTimeAsync(200);
    window.dispatchEvent(new Event('online'));
    await vi.advanceTimersByTimeAsync(0);
    expect(attemptsAt).toEqual([0, 200]);
  });

  it('does not try while the browser says it is offline', async () => {
    vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(false);
    sync.start();
    await vi.advanceTimersByTimeAsync(1000);
    expect(attemptsAt).toEqual([]);
    expect(sync.phase()).toBe('offline');
  });
});
