import { findCrossing, type Crossing, type TieRule } from './curve-crossing';
import {
  screenThresholdAnswers,
  type OutOfOrderRule,
  type ThresholdAnswer,
} from './threshold-answers';
import { buildThresholdCurves, type ThresholdCurves } from './threshold-curves';
import { buildTrialCurve, type LikelihoodCalibration, type TrialCurve } from './trial-curve';

/**
 * Which curves define the points of marginal cheapness and expensiveness (both are in use):
 * - 'cheap-expensive' (default): PMC = too cheap ∩ expensive, PME = cheap ∩ too expensive;
 * - 'not-cheap-not-expensive': PMC = too cheap ∩ not cheap, PME = not expensive ∩ too expensive.
 */
export type MarginalPointConvention = 'cheap-expensive' | 'not-cheap-not-expensive';

export interface PriceThresholdSpec {
  readonly answers: readonly ThresholdAnswer[];
  readonly convention?: MarginalPointConvention;
  readonly tieRule?: TieRule;
  readonly outOfOrder?: OutOfOrderRule;
  /** Also build the Newton–Miller–Smith trial and revenue curves (needs both likelihoods). */
  readonly withTrialCurve?: boolean;
  readonly trialCalibration?: LikelihoodCalibration;
}

export interface PriceThresholdResult {
  readonly n: number;
  readonly outOfOrderRespondents: number;
  readonly curves: ThresholdCurves;
  /** too cheap ∩ too expensive. */
  readonly optimalPrice: Crossing | null;
  /** cheap ∩ expensive. */
  readonly indifferencePrice: Crossing | null;
  readonly marginalCheapnessPrice: Crossing | null;
  readonly marginalExpensivenessPrice: Crossing | null;
  /** [marginal cheapness, marginal expensiveness]. */
  readonly acceptableRange: { readonly low: number; readonly high: number } | null;
  readonly convention: MarginalPointConvention;
  readonly tieRule: TieRule;
  /** Newton–Miller–Smith curves, when asked for. */
  readonly trial: TrialCurve | null;
  readonly warnings: string[];
  readonly assumptions: string[];
}

/**
 * Van Westendorp price sensitivity meter: the four cumulative curves on the union price grid and
 * the crossing points, interpolated linearly between grid prices.
 */
export function analysePriceThresholds(spec: PriceThresholdSpec): PriceThresholdResult {
  const convention = spec.convention ?? 'cheap-expensive';
  const tieRule = spec.tieRule ?? 'midpoint';
  const outOfOrderRule = spec.outOfOrder ?? 'exclude';
  const { kept, outOfOrder } = screenThresholdAnswers(spec.answers, outOfOrderRule);
  const c = buildThresholdCurves(kept);
  const cross = (f: number[], g: number[]) => findCrossing(c.prices, f, g, tieRule);
  const a = convention === 'cheap-expensive';
  const points = {
    optimalPrice: cross(c.tooCheap, c.tooExpensive),
    indifferencePrice: cross(c.cheap, c.expensive),
    marginalCheapnessPrice: a ? cross(c.tooCheap, c.expensive) : cross(c.tooCheap, c.notCheap),
    marginalExpensivenessPrice: a
      ? cross(c.cheap, c.tooExpensive)
      : cross(c.notExpensive, c.tooExpensive),
  };
  const warnings = Object.entries(points)
    .filter(([, point]) => point === null)
    .map(([name]) => `${name}: the curves do not cross on the stated prices`);
  const { marginalCheapnessPrice: low, marginalExpensivenessPrice: high } = points;
  return {
    n: kept.reduce((s, a) => s + (a.count ?? 1), 0),
    outOfOrderRespondents: outOfOrder,
    curves: c,
    ...points,
    acceptableRange: low && high ? { low: low.price, high: high.price } : null,
    convention,
    tieRule,
    trial: spec.withTrialCurve ? buildTrialCurve(kept, spec.trialCalibration, tieRule) : null,
    warnings,
    assumptions: thresholdAssumptions(convention, tieRule, outOfOrderRule, outOfOrder),
  };
}

function thresholdAssumptions(
  convention: MarginalPointConvention,
  tieRule: TieRule,
  rule: OutOfOrderRule,
  outOfOrder: number,
): string[] {
  return [
    'too cheap and cheap curves count answers at or above the price; expensive and too expensive at or below',
    'curves evaluated on the union of stated prices and interpolated linearly',
    convention === 'cheap-expensive'
      ? 'point of marginal cheapness where too cheap crosses expensive; point of marginal expensiveness where cheap crosses too expensive'
      : 'point of marginal cheapness where too cheap crosses not cheap; point of marginal expensiveness where not expensive crosses too expensive',
    `a run of tied grid prices is placed at its ${tieRule === 'midpoint' ? 'midpoint' : 'first price'}`,
    rule === 'exclude'
      ? `${outOfOrder} ${outOfOrder === 1 ? 'respondent' : 'respondents'} with thresholds out of order left out`
      : 'respondents with thresholds out of order kept as answered',
  ];
}
