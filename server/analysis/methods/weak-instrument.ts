import type { DemandFit } from '@shared/estimation/least-squares/demand-fit';

/** Below this first-stage F an instrument is weak (Staiger and Stock's rule of thumb, common practice). */
export const weakInstrumentF = 10;

/**
 * A warning for each instrumented regressor whose first stage is weak: the two-stage estimates
 * then lean towards least squares and their intervals are too narrow, which a statistic in a
 * row of statistics does not make plain.
 */
export function weakInstrumentWarnings(fit: Pick<DemandFit, 'firstStages'>): string[] {
  return (fit.firstStages ?? [])
    .filter((stage) => stage.fStatistic !== null && stage.fStatistic < weakInstrumentF)
    .map(
      (stage) =>
        `Weak instrument: the first-stage F for ${stage.endogenous.replace(/_/g, ' ')} is ` +
        `${stage.fStatistic!.toFixed(2)}, below about ${weakInstrumentF}. The two-stage estimates ` +
        'may be biased towards ordinary least squares and their intervals too narrow; read them ' +
        'with care or choose a stronger instrument.',
    );
}
