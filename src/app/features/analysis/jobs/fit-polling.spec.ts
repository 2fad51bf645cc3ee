import { Observable, of, throwError } from 'rxjs';
import { isFinished, pollJob, type JobLike } from './fit-polling';

interface Job extends JobLike {
  readonly progress: number;
}

/** A fake endpoint answering each call with the next job state, or failing where `null`. */
function endpoint(answers: (Job | null)[]) {
  let calls = 0;
  const load = (): Observable<Job> => {
    const answer = answers[Math.min(calls, answers.length - 1)];
    calls += 1;
    return answer === null ? throwError(() => new Error('connection dropped')) : of(answer);
  };
  return { load, calls: () => calls };
}

describe('pollJob', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('asks at once, then every interval, and stops after the finished job', () => {
    const server = endpoint([
      { status: 'queued', progress: 0 },
      { status: 'running', progress: 40 },
      { status: 'done', progress: 100 },
    ]);
    const seen: Job[] = [];
    let completed = false;
    pollJob(server.load, { intervalMs: 500, transientErrors: 0 }).subscribe({
      next: (job) => seen.push(job),
      complete: () => (completed = true),
    });
    vi.advanceTimersByTime(0);
    expect(seen.map((j) => j.status)).toEqual(['queued']);
    vi.advanceTimersByTime(500);
    expect(seen.map((j) => j.progress)).toEqual([0, 40]);
    vi.advanceTimersByTime(500);
    expect(seen.map((j) => j.status)).toEqual(['queued', 'running', 'done']);
    expect(completed).toBe(true);
    vi.advanceTimersByTime(5000);
    expect(server.calls()).toBe(3);
  });

  it('ends with a failed job as well', () => {
    const server = endpoint([{ status: 'failed', progress: 10 }]);
    const seen: Job[] = [];
    pollJob(server.load, { intervalMs: 500, transientErrors: 0 }).subscribe((job) =>
      seen.push(job),
    );
    vi.advanceTimersByTime(2000);
    expect(seen).toEqual([{ status: 'failed', progress: 10 }]);
    expect(server.calls()).toBe(1);
  });

  it('rides out a dropped request and carries on polling', () => {
    const server = endpoint([
      { status: 'running', progress: 20 },
      null,
      { status: 'done', progress: 100 },
    ]);
    const seen: Job[] = [];
    let failure: unknown = null;
    pollJob(server.load, { intervalMs: 300, transientErrors: 2 }).subscribe({
      next: (job) => seen.push(job),
      error: (error: unknown) => (failure = error),
    });
    vi.advanceTimersByTime(300); // second call fails, retried after 300 ms
    vi.advanceTimersByTime(300);
    expect(failure).toBeNull();
    expect(seen.map((j) => j.status)).toEqual(['running', 'done']);
  });

  it('gives up with the error once the retries are spent', () => {
    const server = endpoint([null]);
    let failure: unknown = null;
    pollJob(server.load, { intervalMs: 100, transientErrors: 2 }).subscribe({
      error: (error: unknown) => (failure = error),
    });
    vi.advanceTimersByTime(1000);
    expect((failure as Error).message).toBe('connection dropped');
    expect(server.calls()).toBe(3);
  });

  it('stops asking when the screen unsubscribes', () => {
    const server = endpoint([{ status: 'running', progress: 5 }]);
    const subscription = pollJob(server.load, { intervalMs: 100, transientErrors: 0 }).subscribe();
    vi.advanceTimersByTime(250);
    subscription.unsubscribe();
    vi.advanceTimersByTime(1000);
    expect(server.calls()).toBe(3);
  });

  it('knows which states are final', () => {
    expect(
      ['queued', 'running', 'done', 'failed'].map((s) => isFinished({ status: s } as Job)),
    ).toEqual([false, false, true, true]);
  });
});
