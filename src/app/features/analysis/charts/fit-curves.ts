import type { FitResult } from '@shared/analysis/fit-result';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { fittedCurveFrom } from '@shared/analysis/fitted-curve';
import { evenPrices, sampleFittedCurve, type BandedCurve } from './banded-curve';
import type { AxisTitles } from './demand-chart-options';

/** Points per drawn curve: smooth at any chart width without slowing the page. */
const chartPoints = 121;

/** The prices a fit's chart spans: its schedule's grid, widened to the observed prices. */
export function chartPriceSpan(spec: FitSpec, result: FitResult): { min: number; max: number } {
  const observed = result.curve?.observedPriceRange;
  const min = Math.min(spec.priceGrid.from, observed?.min ?? Infinity);
  const max = Math.max(spec.priceGrid.to, observed?.max ?? -Infinity);
  return { min, max };
}

/** A fit's curve with its band, sampled for drawing, or null when the method gives no curve. */
export function fitBandedCurve(
  label: string,
  spec: FitSpec,
  result: FitResult,
  span = chartPriceSpan(spec, result),
): BandedCurve | null {
  if (!result.curve) return null;
  const curve = fittedCurveFrom(result.curve);
  return sampleFittedCurve(
    label,
    curve,
    evenPrices(span.min, span.max, chartPoints),
    spec.confidenceLevel,
  );
}

/** Axis titles for a demand chart in a currency. */
export function demandAxisTitles(quantityKind: 'quantity' | 'share', currency: string): AxisTitles {
  return {
    x: `Price (${currency})`,
    y: quantityKind === 'share' ? 'Share of people who would buy' : 'Quantity per period',
    revenue:
      quantityKind === 'share'
        ? `Revenue per potential buyer (${currency})`
        : `Revenue (${currency})`,
  };
}
