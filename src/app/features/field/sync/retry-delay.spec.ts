import { retryDelayMs } from './retry-delay';

const policy = { baseMs: 1000, maxMs: 60_000 };

describe('retryDelayMs', () => {
  it('does not wait before the first attempt', () => {
    expect(retryDelayMs(0, policy, () => 0.99)).toBe(0);
  });

  it('doubles the longest wait with each failure (exponential backoff)', () => {
    const longest = [1, 2, 3, 4, 5].map((n) => retryDelayMs(n, policy, () => 0.999999));
    expect(longest).toEqual([999, 1999, 3999, 7999, 15999]);
  });

  it('never waits longer than the cap, however many failures', () => {
    expect(retryDelayMs(40, policy, () => 0.999999)).toBe(59999);
    expect(retryDelayMs(1000, policy, () => 0.999999)).toBe(59999);
  });

  it('spreads the wait between zero and the ceiling (full jitter)', () => {
    expect(retryDelayMs(3, policy, () => 0)).toBe(0);
    expect(retryDelayMs(3, policy, () => 0.5)).toBe(2000);
    const draws = Array.from({ length: 200 }, () => retryDelayMs(4, policy));
    expect(Math.min(...draws)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...draws)).toBeLessThan(8000);
    expect(new Set(draws).size).toBeGreaterThan(100);
  });
});
