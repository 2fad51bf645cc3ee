import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { checkoutRoot } from '../stack/state-dir';
import { median } from './timed-rounds';

/** What the naive path (pull every row into Node, fit there) cost, over a few runs. */
export interface NaiveRuns {
  readonly seconds: number;
  readonly pullSeconds: number;
  readonly peakRssMegabytes: number;
  /** [estimate, standard error] per coefficient, from the last run. */
  readonly coefficients: readonly (readonly [number, number])[];
}

/** Runs naive-fit.ts `runs` times, each in a fresh process (so each peak RSS is its own). */
export function naivePath(
  url: string,
  table: string,
  columns: { response: string; regressors: readonly string[] },
  runs: number,
): NaiveRuns {
  const results = Array.from({ length: runs }, () => {
    const child = spawnSync(
      join(checkoutRoot, 'node_modules', '.bin', 'tsx'),
      [
        join(checkoutRoot, 'tools', 'bench', 'naive-fit.ts'),
        url,
        table,
        columns.response,
        ...columns.regressors,
      ],
      { cwd: checkoutRoot, encoding: 'utf8', maxBuffer: 1 << 20 },
    );
    if (child.status !== 0) throw new Error(`the naive fit failed: ${child.stderr}`);
    return JSON.parse(child.stdout.trim().split('\n').at(-1)!) as NaiveRuns;
  });
  return {
    seconds: median(results.map((r) => r.seconds)),
    pullSeconds: median(results.map((r) => r.pullSeconds)),
    peakRssMegabytes: Math.max(...results.map((r) => r.peakRssMegabytes)),
    coefficients: results[results.length - 1].coefficients,
  };
}
