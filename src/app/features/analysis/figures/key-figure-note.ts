import type { CurveEnsemble } from '@shared/analysis/estimated-figure';
import type { KeyFigure } from '@shared/analysis/fit-result';
import { curveFigures, type FigureOutcome } from './curve-figures';

const noIntervalFromMethod = 'no interval: the method gives none for this figure';

/**
 * Why a key figure has no interval, so no figure stands alone as if it were known exactly. The
 * fit stores only the figure; for an optimal price the reason is found again on the same seeded
 * curves the server drew (too few of them have a best price, say).
 */
export function keyFigureNote(
  figure: KeyFigure,
  ensemble: CurveEnsemble | null,
  unitCost: number | null,
): string | null {
  if (figure.ciLow !== null && figure.ciHigh !== null) return null;
  if (!ensemble || figure.unit !== 'price') return noIntervalFromMethod;
  if (figure.label.startsWith('Revenue-maximising price')) {
    return reason(curveFigures(ensemble, null, null).revenueMaxPrice);
  }
  if (figure.label.startsWith('Profit-maximising price') && unitCost !== null) {
    const outcome = curveFigures(ensemble, null, unitCost).profitMaxPrice;
    return outcome ? reason(outcome) : noIntervalFromMethod;
  }
  return noIntervalFromMethod;
}

function reason(outcome: FigureOutcome): string {
  if (!outcome.ok) return outcome.message;
  return outcome.figure.note ?? noIntervalFromMethod;
}
