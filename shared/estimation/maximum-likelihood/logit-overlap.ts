import { EstimationError } from '../estimation-error';
import { largest, smallest } from '../numerics/extent';

/**
 * The logit maximum-likelihood estimate with one regressor exists only when the "yes" and "no"
 * answers overlap in x (no complete or quasi-complete separation; Albert & Anderson 1984, from
 * memory). Throws 'no-finite-estimate' naming `field` when they do not. Answers with a fractional
 * outcome count towards both sides.
 */
export function assertLogitOverlap(
  x: readonly number[],
  yesWeight: readonly number[],
  noWeight: readonly number[],
  field: string,
): void {
  const yesX = x.filter((_, i) => yesWeight[i] > 0);
  const noX = x.filter((_, i) => noWeight[i] > 0);
  if (yesX.length === 0 || noX.length === 0) {
    const all = yesX.length === 0 ? 'no' : 'yes';
    throw new EstimationError(
      'no-finite-estimate',
      `every answer is "${all}", so the logistic curve has no finite estimate`,
      field,
    );
  }
  const separated = largest(yesX) <= smallest(noX) || smallest(yesX) >= largest(noX);
  if (separated) {
    throw new EstimationError(
      'no-finite-estimate',
      `"yes" and "no" answers do not overlap in ${field} (perfect separation), so the logistic curve has no finite estimate`,
      field,
    );
  }
}
