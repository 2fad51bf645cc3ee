import { sortedQuantile } from '../estimation/resampling/sorted-quantile';
import type { DemandCurve } from '../estimation/welfare/demand-curve';

/** A figure shown to a researcher or client: always an estimate, with its interval when known. */
export interface EstimatedFigure {
  readonly estimate: number;
  readonly low: number | null;
  readonly high: number | null;
  /** Why there is no interval, or what limits it. */
  readonly note: string | null;
}

/** The central fitted curve and curves drawn from its estimates' sampling distribution. */
export interface CurveEnsemble {
  readonly central: DemandCurve;
  /** Empty when the model gives no way to draw (a step curve); then `requested` is 0. */
  readonly draws: readonly DemandCurve[];
  /** Draws asked for; those whose parameters give no valid curve count as having no value. */
  readonly requested: number;
  readonly confidenceLevel: number;
}

// Below this share of usable draws the percentiles would describe a selected subset only.
const minimumUsableShare = 0.9;

/**
 * A figure computed on the central curve, with a percentile interval from the same figure on
 * each drawn curve. Throws what the central computation throws (the caller shows the message);
 * when too many draws have no value (no interior maximum, say) the interval is withheld.
 */
export function estimateOnEnsemble(
  ensemble: CurveEnsemble,
  figure: (curve: DemandCurve) => number,
): EstimatedFigure {
  return estimateFieldsOnEnsemble(ensemble, (curve) => ({ value: figure(curve) })).value;
}

/**
 * Several figures that come from one computation per curve (the figures of a policy, say), each
 * with its own percentile interval; the computation runs once per drawn curve.
 */
export function estimateFieldsOnEnsemble<K extends string>(
  ensemble: CurveEnsemble,
  compute: (curve: DemandCurve) => Record<K, number>,
): Record<K, EstimatedFigure> {
  const central = compute(ensemble.central);
  const keys = Object.keys(central) as K[];
  const samples = new Map<K, number[]>(keys.map((key) => [key, []]));
  for (const curve of ensemble.draws) {
    try {
      const values = compute(curve);
      for (const key of keys) if (Number.isFinite(values[key])) samples.get(key)!.push(values[key]);
    } catch {
      // A draw without a value counts against the usable share below.
    }
  }
  const result = {} as Record<K, EstimatedFigure>;
  for (const key of keys) {
    result[key] = withInterval(central[key], samples.get(key)!, ensemble);
  }
  return result;
}

function withInterval(
  estimate: number,
  values: number[],
  ensemble: CurveEnsemble,
): EstimatedFigure {
  const drawn = ensemble.requested;
  if (drawn === 0) return { estimate, low: null, high: null, note: 'this model gives no interval' };
  if (values.length < minimumUsableShare * drawn) {
    const note =
      `too few simulated curves give a value (${values.length} of ${drawn}; ` +
      `${Math.round(minimumUsableShare * 100)} % are needed), so no interval is shown`;
    return { estimate, low: null, high: null, note };
  }
  values.sort((a, b) => a - b);
  const tail = (1 - ensemble.confidenceLevel) / 2;
  return {
    estimate,
    low: sortedQuantile(values, tail),
    high: sortedQuantile(values, 1 - tail),
    note: null,
  };
}
