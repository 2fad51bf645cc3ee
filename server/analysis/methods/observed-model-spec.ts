import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { notStatedLevel } from '@shared/analysis/weighting-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { DemandModelSpec } from '@shared/estimation/least-squares/demand-model-spec';
import type { ObservedRow } from '../analysis-dataset';
import { weightOf, type RespondentWeights } from '../respondent-weights';

/**
 * The engine's demand-model spec for observed rows: quantity on price (logged as the form
 * says), the chosen covariates, region fixed effects, raking weights, the standard-error type,
 * and the peer-price instrument. Refuses, naming the interview, a value a log form cannot take.
 */
export function observedModelSpec(
  rows: readonly ObservedRow[],
  spec: FitSpecOf<'observed-prices'>,
  weights: RespondentWeights | null,
): DemandModelSpec {
  if (spec.form !== 'linear') refuseNonPositive(rows, spec.form);
  const column = (name: string, read: (row: ObservedRow) => number) => ({
    name,
    values: rows.map(read),
  });
  const covariates = spec.covariates.map((covariate) =>
    covariate === 'income'
      ? { ...column('income', (r) => r.income ?? NaN), role: 'income' as const }
      : column('household_size', (r) => r.householdSize ?? NaN),
  );
  return {
    form: spec.form,
    quantity: column('quantity', (r) => r.quantity),
    price: column('price', (r) => r.price),
    covariates,
    fixedEffects: spec.regionEffects
      ? [{ name: 'region', values: rows.map((r) => r.region ?? notStatedLevel) }]
      : [],
    weights: weights ? column('weight', (r) => weightOf(weights, r.interviewId)) : undefined,
    standardErrors:
      spec.standardErrors === 'cluster-point'
        ? {
            type: 'cluster',
            clusters: { name: 'point', values: rows.map((r) => r.pointId ?? r.interviewId) },
          }
        : { type: spec.standardErrors },
    confidenceLevel: spec.confidenceLevel,
    instruments:
      spec.instrument === 'peer-price'
        ? [column('peer_price', (r) => r.peerPrice ?? NaN)]
        : undefined,
  };
}

function refuseNonPositive(rows: readonly ObservedRow[], form: 'loglog' | 'semilog'): void {
  const formName = form === 'loglog' ? 'log-log' : 'semi-log';
  for (const row of rows) {
    if (!(row.quantity > 0)) {
      throw new EstimationError(
        'non-positive-log',
        `interview ${row.interviewId}: quantity ${row.quantity} is not positive, so the ${formName} ` +
          'form cannot take its logarithm; choose the linear form or filter the interview out',
        'quantity',
      );
    }
    if (form === 'loglog' && !(row.price > 0)) {
      throw new EstimationError(
        'non-positive-log',
        `interview ${row.interviewId}: price ${row.price} is not positive, so the log-log form ` +
          'cannot take its logarithm; choose another form or filter the interview out',
        'price',
      );
    }
  }
}
