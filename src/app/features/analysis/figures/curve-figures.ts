import { EstimationError } from '@shared/estimation/estimation-error';
import { consumerSurplus } from '@shared/estimation/welfare/consumer-surplus';
import type { DemandCurve } from '@shared/estimation/welfare/demand-curve';
import { optimalPrice } from '@shared/estimation/welfare/optimal-price';
import { pointElasticity } from '@shared/estimation/welfare/point-elasticity';
import {
  estimateOnEnsemble,
  type CurveEnsemble,
  type EstimatedFigure,
} from '@shared/analysis/estimated-figure';

/** A figure, or why the curve gives none (said so a researcher can act on it). */
export type FigureOutcome =
  | { readonly ok: true; readonly figure: EstimatedFigure }
  | { readonly ok: false; readonly message: string };

/** The figures the researcher asks of a fitted curve at a typed price and unit cost. */
export interface CurveFigures {
  readonly quantityAtPrice: FigureOutcome | null;
  readonly elasticityAtPrice: FigureOutcome | null;
  readonly consumerSurplusAtPrice: FigureOutcome | null;
  readonly revenueMaxPrice: FigureOutcome;
  readonly profitMaxPrice: FigureOutcome | null;
}

/** Sentence case and a full stop for an engine message. */
export function asSentence(text: string): string {
  const trimmed = text.trim();
  const end = /[.!?]$/.test(trimmed) ? '' : '.';
  return `${trimmed.charAt(0).toUpperCase()}${trimmed.slice(1)}${end}`;
}

/** One figure on the ensemble; an engine refusal becomes its message. */
export function outcomeOf(
  ensemble: CurveEnsemble,
  figure: (curve: DemandCurve) => number,
): FigureOutcome {
  try {
    return { ok: true, figure: estimateOnEnsemble(ensemble, figure) };
  } catch (error) {
    if (error instanceof EstimationError) return { ok: false, message: asSentence(error.message) };
    throw error;
  }
}

const usable = (value: number | null): value is number =>
  value !== null && Number.isFinite(value) && value >= 0;

/**
 * Quantity, point elasticity and consumer surplus at `price`; the revenue-maximising price; and,
 * with a unit cost, the profit-maximising price. Each an estimate with a simulation interval.
 */
export function curveFigures(
  ensemble: CurveEnsemble,
  price: number | null,
  unitCost: number | null,
): CurveFigures {
  const atPrice = usable(price);
  return {
    quantityAtPrice: atPrice ? outcomeOf(ensemble, (c) => c.quantity(price)) : null,
    elasticityAtPrice: atPrice ? outcomeOf(ensemble, (c) => pointElasticity(c, price)) : null,
    consumerSurplusAtPrice: atPrice ? outcomeOf(ensemble, (c) => consumerSurplus(c, price)) : null,
    revenueMaxPrice: outcomeOf(ensemble, (c) => optimalPrice(c, 0)),
    profitMaxPrice: usable(unitCost) ? outcomeOf(ensemble, (c) => optimalPrice(c, unitCost)) : null,
  };
}
