/** Medians of repeated timings, taken in interleaved rounds so load on the machine hits all alike. */
export async function timedRounds(
  tasks: Readonly<Record<string, () => Promise<unknown>>>,
  rounds: number,
): Promise<Record<string, number>> {
  // One untimed run each first: page cache, catalogue caches and connections warmed.
  for (const task of Object.values(tasks)) await task();
  const seconds: Record<string, number[]> = {};
  for (let round = 0; round < rounds; round++) {
    for (const [name, task] of Object.entries(tasks)) {
      const started = performance.now();
      await task();
      (seconds[name] ??= []).push((performance.now() - started) / 1000);
    }
  }
  return Object.fromEntries(Object.entries(seconds).map(([name, times]) => [name, median(times)]));
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}
