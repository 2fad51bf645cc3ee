import {
  cellSupport,
  minimumCellRespondents,
  type RespondentEvidence,
} from '@shared/analysis/cell-support';
import type { FitSchedule } from '@shared/analysis/fit-result';
import type { PriceGridSpec } from '@shared/analysis/fit-spec';
import { buildDemandSchedule } from '@shared/estimation/demand-schedule/demand-schedule';
import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import { countOf, priceWriter } from './price-text';

const bandFloor = {
  quantity: 'a band is cut at zero: quantities cannot be negative',
  share: 'a band is cut at zero: shares cannot be negative',
} as const;

export interface ScheduleOutcome {
  readonly schedule: FitSchedule;
  readonly warnings: string[];
}

/**
 * The fit's demand schedule on the researcher's grid, with how many respondents each cell rests
 * on; prices outside the observed range are allowed but flagged, and cells under the minimum are
 * named (publishing refuses them).
 */
export function fitSchedule(
  curve: FittedDemandCurve,
  grid: PriceGridSpec,
  confidenceLevel: number,
  evidence: readonly RespondentEvidence[],
  designLevels: readonly number[] | null,
  currency: string,
): ScheduleOutcome {
  const money = priceWriter(currency);
  const list = (prices: readonly number[]) =>
    prices.slice(0, 8).map(money).join(', ') + (prices.length > 8 ? ', …' : '');
  const built = buildDemandSchedule(nonNegativeBand(curve), grid, confidenceLevel);
  const prices = built.rows.map((row) => row.price);
  const support = cellSupport(prices, evidence, designLevels ?? undefined);
  const rows = built.rows.map((row, i) => ({ ...row, respondents: support[i] }));
  const warnings: string[] = [];
  const outside = rows.filter((row) => row.extrapolated).map((row) => row.price);
  if (outside.length > 0) {
    warnings.push(
      `${countOf(outside.length, 'grid price')} ${outside.length === 1 ? 'lies' : 'lie'} outside the observed prices ` +
        `${money(built.observedPriceRange.min)}–${money(built.observedPriceRange.max)} and are extrapolation: ${list(outside)}`,
    );
  }
  const thin = rows.filter((row) => row.respondents < minimumCellRespondents);
  if (thin.length > 0) {
    warnings.push(
      `${countOf(thin.length, 'grid price')} ${thin.length === 1 ? 'rests' : 'rest'} on fewer than ${minimumCellRespondents} respondents and ` +
        `cannot be published: ${list(thin.map((row) => row.price))}`,
    );
  }
  return {
    schedule: {
      curveMethod: built.method,
      quantityKind: built.quantityKind,
      confidenceLevel: built.confidenceLevel,
      observedPriceRange: built.observedPriceRange,
      rows,
      assumptions: [...built.assumptions, bandFloor[built.quantityKind]],
    },
    warnings,
  };
}

/** A band that never goes below zero and always contains the prediction (a clipped linear curve). */
function nonNegativeBand(curve: FittedDemandCurve): FittedDemandCurve {
  if (!curve.quantityInterval) return curve;
  const interval = (price: number, level: number) => curve.quantityInterval!(price, level);
  return {
    ...curve,
    quantityInterval: (price, level) => {
      const q = curve.quantity(price);
      const band = interval(price, level);
      return { low: Math.min(Math.max(band.low, 0), q), high: Math.max(band.high, q) };
    },
  };
}
