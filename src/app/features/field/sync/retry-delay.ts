/** How a failing sync waits before it tries again. */
export interface RetryPolicy {
  /** The first wait, in milliseconds. */
  readonly baseMs: number;
  /** No wait is longer than this. */
  readonly maxMs: number;
}

export const defaultRetryPolicy: RetryPolicy = { baseMs: 2_000, maxMs: 5 * 60_000 };

/**
 * The wait before retry number `failures` (1 after the first failure): exponential backoff with
 * "full jitter" — a random wait between zero and base · 2^(failures−1), capped — so that many
 * devices coming back online at once do not hit the server in step. `random` returns [0, 1).
 */
export function retryDelayMs(
  failures: number,
  policy: RetryPolicy = defaultRetryPolicy,
  random: () => number = Math.random,
): number {
  if (failures <= 0) return 0;
  const ceiling = Math.min(policy.maxMs, policy.baseMs * 2 ** Math.min(failures - 1, 30));
  return Math.floor(random() * ceiling);
}
