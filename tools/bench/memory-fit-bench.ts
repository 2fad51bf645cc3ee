import { fitLinearModel } from '@shared/estimation/least-squares/fit-linear-model';
import { largeClusterDesign } from '@shared/estimation/least-squares/large-cluster-design';
import type { BenchPart } from './bench-part';
import { timedRounds } from './timed-rounds';

const ROUNDS = 7;

/**
 * The in-memory engine's speed on a small study: 10 000 rows × 8 regressors with cluster-robust
 * errors, the size a browser or the fit command line handles (target: well under a second).
 */
export const memoryFitBench: BenchPart = {
  name: 'memory-fit',
  async run(context) {
    const design = largeClusterDesign(10_000);
    const figures = await timedRounds(
      { cluster: () => Promise.resolve(fitLinearModel(design)) },
      ROUNDS,
    );
    context.report('memory-fit-10k-cluster-ms', figures['cluster'] * 1000, 'ms');
  },
};
