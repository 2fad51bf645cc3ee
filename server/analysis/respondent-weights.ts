import type { WeightingSummary } from '@shared/analysis/fit-result';
import type { WeightingSpec } from '@shared/analysis/weighting-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import { kishDesignEffect } from '@shared/estimation/weighting/design-effect';
import { rake } from '@shared/estimation/weighting/raking';
import { respondentIds, respondentsOf, type AnalysisDataset } from './analysis-dataset';
import { largest, smallest } from '@shared/estimation/numerics/extent';

export interface RespondentWeights {
  /** Raking weight per respondent (interview id), scaled to sum to the number of respondents. */
  readonly byRespondent: ReadonlyMap<string, number>;
  readonly summary: WeightingSummary;
}

/**
 * Rakes the dataset's respondents to the researcher's margins and reports the design effect and
 * effective sample size. Null without a weighting spec (every weight 1).
 */
export function respondentWeights(
  dataset: AnalysisDataset,
  weighting: WeightingSpec | null,
): RespondentWeights | null {
  if (!weighting) return null;
  const ids = respondentIds(dataset);
  if (ids.length === 0)
    throw new EstimationError(
      'too-few-observations',
      'no respondents are left to weight',
      'weighting',
    );
  const countOf = new Map<string, number>();
  for (const row of dataset.rows)
    countOf.set(row.interviewId, 'count' in row ? respondentsOf(row) : 1);
  const counts = ids.map((id) => countOf.get(id) ?? 1);
  const variables: Record<string, string[]> = {};
  const targets: Record<string, Record<string, number>> = {};
  for (const margin of weighting.margins) {
    variables[margin.variable] = ids.map((id) => dataset.profiles.get(id)!.levels[margin.variable]);
    targets[margin.variable] = margin.targets;
    refuseEmptiedLevels(margin.variable, variables[margin.variable], margin.targets);
  }
  const raked = rakeExplained(variables, targets, counts, weighting.maxIterations ?? 100);
  const effect = kishDesignEffect(raked.weights, counts);
  return {
    byRespondent: new Map(ids.map((id, i) => [id, raked.weights[i]])),
    summary: {
      variables: weighting.margins.map((m) => m.variable),
      n: raked.n,
      designEffect: effect.designEffect,
      effectiveSampleSize: effect.effectiveSampleSize,
      weightCv: effect.weightCv,
      iterations: raked.iterations,
      maxMarginError: raked.maxMarginError,
      minWeight: smallest(raked.weights),
      maxWeight: largest(raked.weights),
    },
  };
}

/** The weight of a respondent, 1 when unweighted. */
export function weightOf(weights: RespondentWeights | null, interviewId: string): number {
  return weights?.byRespondent.get(interviewId) ?? 1;
}

/** The weight a row carries: its respondent's weight, times the respondents a cell stands for. */
export function rowWeight(
  weights: RespondentWeights | null,
  row: { readonly interviewId: string; readonly count?: number },
): number {
  return weightOf(weights, row.interviewId) * respondentsOf(row);
}

/** A level with respondents but a zero target would get weight 0: say so rather than divide by it. */
function refuseEmptiedLevels(
  variable: string,
  levels: readonly string[],
  targets: Readonly<Record<string, number>>,
): void {
  for (const level of new Set(levels)) {
    if (targets[level] === 0) {
      throw new EstimationError(
        'invalid-value',
        `${variable} = ${level} has respondents but a target of 0; give it a share or filter them out`,
        variable,
      );
    }
  }
}

/** Raking, with a refusal that says why margins may be impossible to meet together. */
function rakeExplained(
  variables: Record<string, string[]>,
  targets: Record<string, Record<string, number>>,
  counts: readonly number[],
  maxIterations: number,
) {
  try {
    return rake({ variables, targets, counts, maxIterations, tolerance: 1e-9 });
  } catch (error) {
    if (!(error instanceof EstimationError) || error.code !== 'not-converged') throw error;
    throw new EstimationError(
      'not-converged',
      `${error.message}. The margins of ${Object.keys(targets).join(' and ')} cannot all be met by ` +
        'these respondents: in this sample some levels always occur together (or never do), so ' +
        'the targets contradict each other; loosen a margin, merge levels or drop a variable',
      'targets',
    );
  }
}
