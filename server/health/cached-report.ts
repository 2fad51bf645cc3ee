/** How long one probe of the dependencies answers for: anonymous callers cannot make more. */
export const healthReportMaxAgeMs = 15_000;

/**
 * The latest result of an expensive check, reused for `maxAgeMs`; callers arriving while a check
 * runs share it. Held per web process: it is only a probe, and each process probing at most
 * every 15 s costs nothing.
 */
export class CachedReport<T> {
  private latest: { at: number; report: Promise<T> } | undefined;

  constructor(
    private readonly check: () => Promise<T>,
    private readonly maxAgeMs = healthReportMaxAgeMs,
    private readonly now: () => number = Date.now,
  ) {}

  current(): Promise<T> {
    const time = this.now();
    if (!this.latest || time - this.latest.at >= this.maxAgeMs) {
      const report = this.check();
      this.latest = { at: time, report };
      // A failed check is not kept: the next caller tries again.
      report.catch(() => {
        if (this.latest?.report === report) this.latest = undefined;
      });
    }
    return this.latest.report;
  }
}
