import { EstimationError } from '../estimation-error';
import type { TieRule } from './curve-crossing';
import type { ThresholdAnswer } from './threshold-answers';
import { largest } from '../numerics/extent';
import { sweepTrialSums, type TrialKnots } from './trial-sweep';

/** Purchase probability for each stated likelihood 1–5. */
export type LikelihoodCalibration = Readonly<Record<1 | 2 | 3 | 4 | 5, number>>;

/**
 * Default Newton–Miller–Smith calibration 5 → 0.7, 4 → 0.5, 3 → 0.3, 2 → 0.1, 1 → 0.
 * Common practice / from memory, not verified against the 1993 paper: override it per study.
 */
export const defaultLikelihoodCalibration: LikelihoodCalibration = {
  5: 0.7,
  4: 0.5,
  3: 0.3,
  2: 0.1,
  1: 0,
};

export interface TrialCurve {
  readonly prices: number[];
  /** Mean calibrated purchase probability at each price. */
  readonly trial: number[];
  /** price × trial. */
  readonly revenue: number[];
  /** The largest trial; `price` by the tie rule within the first run of tied grid prices. */
  readonly maxTrial: {
    readonly value: number;
    readonly price: number;
    readonly tiedFrom: number;
    readonly tiedTo: number;
  };
  /** The continuous maximum of price × trial (it may lie between grid prices). */
  readonly maxRevenue: { readonly value: number; readonly price: number };
}

/**
 * Newton–Miller–Smith trial and revenue curves. Each respondent's curve is 0 outside
 * (too cheap, too expensive), linear from 0 at too cheap to P(cheap) at cheap, to P(expensive) at
 * expensive, and back to 0 at too expensive; the trial curve is their weighted mean. As a mean of
 * piecewise-linear curves it is piecewise linear with knots on the union grid, so its grid
 * values describe it exactly.
 */
export function buildTrialCurve(
  answers: readonly ThresholdAnswer[],
  calibration: LikelihoodCalibration = defaultLikelihoodCalibration,
  tieRule: TieRule = 'midpoint',
): TrialCurve {
  const knots = answers.map((a, i) => respondentKnots(a, i, calibration));
  const prices = [
    ...new Set(answers.flatMap((a) => [a.tooCheap, a.cheap, a.expensive, a.tooExpensive])),
  ].sort((x, y) => x - y);
  const position = new Map(prices.map((p, j) => [p, j]));
  const total = answers.reduce((s, a) => s + (a.weight ?? 1), 0);
  // Ordered knots (every answer, unless out-of-order ones are kept) go through one sweep of
  // the grid; out-of-order ones are evaluated price by price as before.
  const ordered: TrialKnots[] = [];
  const unordered: number[] = [];
  knots.forEach((k, i) => {
    if (!(k[0][0] <= k[1][0] && k[1][0] <= k[2][0] && k[2][0] <= k[3][0])) {
      unordered.push(i);
      return;
    }
    const at = k.map(([x]) => position.get(x)!) as unknown as TrialKnots['at'];
    ordered.push({
      weight: answers[i].weight ?? 1,
      at,
      likelihoodCheap: k[1][1],
      likelihoodExpensive: k[2][1],
    });
  });
  const sums = sweepTrialSums(prices, ordered);
  const trial = prices.map(
    (p, j) =>
      unordered.reduce((s, i) => s + (answers[i].weight ?? 1) * evaluate(knots[i], p), sums[j]) /
      total,
  );
  const revenue = prices.map((p, i) => p * trial[i]);
  return {
    prices,
    trial,
    revenue,
    maxTrial: maximumTrial(prices, trial, tieRule),
    maxRevenue: maximumRevenue(prices, trial),
  };
}

type Knots = readonly [number, number][];

function respondentKnots(a: ThresholdAnswer, i: number, calibration: LikelihoodCalibration): Knots {
  const level = (value: number | undefined, field: string): number => {
    if (value === undefined || ![1, 2, 3, 4, 5].includes(value)) {
      throw new EstimationError(
        'invalid-value',
        `respondent ${i + 1}: ${field} must be an integer 1–5`,
        field,
      );
    }
    return calibration[value as 1 | 2 | 3 | 4 | 5];
  };
  return [
    [a.tooCheap, 0],
    [a.cheap, level(a.likelihoodCheap, 'likelihoodCheap')],
    [a.expensive, level(a.likelihoodExpensive, 'likelihoodExpensive')],
    [a.tooExpensive, 0],
  ];
}

/** Piecewise-linear value; at a knot shared by two segments the later knot's value is taken. */
function evaluate(knots: Knots, p: number): number {
  if (p < knots[0][0] || p > knots[3][0]) return 0;
  for (let k = 3; k >= 1; k--) {
    const [x0, y0] = knots[k - 1];
    const [x1, y1] = knots[k];
    if (p >= x0 && p <= x1) return x1 === x0 ? y1 : y0 + ((p - x0) / (x1 - x0)) * (y1 - y0);
  }
  return 0;
}

function maximumTrial(prices: number[], trial: number[], tieRule: TieRule): TrialCurve['maxTrial'] {
  const value = largest(trial);
  const from = trial.findIndex((t) => Math.abs(t - value) <= 1e-12);
  let to = from;
  while (to + 1 < trial.length && Math.abs(trial[to + 1] - value) <= 1e-12) to++;
  const price = tieRule === 'first' ? prices[from] : (prices[from] + prices[to]) / 2;
  return { value, price, tiedFrom: prices[from], tiedTo: prices[to] };
}

/** Between knots trial = t₀ + s·(p − p₀), so revenue is a parabola with its top at (s·p₀ − t₀)/(2s). */
function maximumRevenue(prices: number[], trial: number[]): TrialCurve['maxRevenue'] {
  let best = { value: -Infinity, price: prices[0] };
  const consider = (price: number, value: number) => {
    if (value > best.value + 1e-15) best = { value, price };
  };
  prices.forEach((p, k) => {
    consider(p, p * trial[k]);
    if (k + 1 === prices.length) return;
    const s = (trial[k + 1] - trial[k]) / (prices[k + 1] - p);
    const top = s < 0 ? (s * p - trial[k]) / (2 * s) : NaN;
    if (top > p && top < prices[k + 1]) consider(top, top * (trial[k] + s * (top - p)));
  });
  return best;
}
