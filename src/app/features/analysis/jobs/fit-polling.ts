import { Observable, defer, exhaustMap, retry, takeWhile, timer } from 'rxjs';

/** Anything with a job status, as the fits API reports it. */
export interface JobLike {
  readonly status: 'queued' | 'running' | 'done' | 'failed';
}

/** Done or failed: nothing more will change. */
export function isFinished(job: JobLike): boolean {
  return job.status === 'done' || job.status === 'failed';
}

/** How often to ask and how many failed requests in a row to ride out. */
export interface PollingOptions {
  readonly intervalMs: number;
  readonly transientErrors: number;
}

export const defaultPolling: PollingOptions = { intervalMs: 800, transientErrors: 3 };

/**
 * Asks for a job now and every `intervalMs` until it is done or failed, emitting each answer
 * (the last one is the finished job); a tick that comes while a request is still out is skipped.
 * A request that fails is retried after the same pause, up to `transientErrors` times, so a
 * dropped connection does not end the wait; unsubscribing stops the polling.
 */
export function pollJob<T extends JobLike>(
  load: () => Observable<T>,
  options: PollingOptions = defaultPolling,
): Observable<T> {
  return timer(0, options.intervalMs).pipe(
    exhaustMap(() =>
      defer(load).pipe(
        retry({ count: options.transientErrors, delay: () => timer(options.intervalMs) }),
      ),
    ),
    takeWhile((job) => !isFinished(job), true),
  );
}
