import { EstimationError } from '../estimation-error';
import type { RawDesign } from './exact-least-squares';
import { finiteColumn, type NamedColumn } from './named-column';

/** The term name of the constant column. */
export const INTERCEPT_TERM = '(intercept)';

/**
 * A validated design, every row multiplied by √wᵢ when there are weights (so weighted least
 * squares is ordinary least squares on these columns).
 */
export interface WeightedDesign {
  readonly n: number;
  readonly names: readonly string[];
  readonly columns: readonly Float64Array[];
  readonly response: Float64Array;
  /** √wᵢ per row, or null for an unweighted fit. */
  readonly rootWeights: Float64Array | null;
  readonly intercept: boolean;
  /** The same design unweighted, with the weights apart (for exact arithmetic). */
  readonly raw: RawDesign;
}

/** What a design is built from. */
export interface DesignInput {
  readonly response: NamedColumn;
  readonly regressors: readonly NamedColumn[];
  readonly intercept: boolean;
  readonly weights?: NamedColumn;
}

/**
 * Checks the response, regressors and weights (lengths, finite values, positive weights,
 * distinct names, more observations than parameters) and builds the weighted design.
 */
export function buildWeightedDesign(input: DesignInput): WeightedDesign {
  const n = input.response.values.length;
  if (n === 0) {
    throw new EstimationError('empty-data', 'there are no observations', input.response.name);
  }
  const names = [
    ...(input.intercept ? [INTERCEPT_TERM] : []),
    ...input.regressors.map((c) => c.name),
  ];
  checkNames(names, input.response.name);
  if (names.length === 0) {
    throw new EstimationError('empty-design', 'the model has no regressors and no intercept');
  }
  if (n <= names.length) {
    throw new EstimationError(
      'too-few-observations',
      `${n} observations cannot estimate ${names.length} coefficients with any residual ` +
        `degrees of freedom; need at least ${names.length + 1}`,
      input.response.name,
    );
  }
  const weights = input.weights ? positiveWeights(input.weights, n) : null;
  const rootWeights = weights ? weights.map(Math.sqrt) : null;
  const weigh = (values: Float64Array): Float64Array =>
    rootWeights ? values.map((v, i) => v * rootWeights[i]) : values;
  const rawColumns = input.regressors.map((column) => finiteColumn(column, n));
  if (input.intercept) rawColumns.unshift(new Float64Array(n).fill(1));
  const rawResponse = finiteColumn(input.response, n);
  return {
    n,
    names,
    columns: rawColumns.map(weigh),
    response: weigh(rawResponse),
    rootWeights,
    intercept: input.intercept,
    raw: { columns: rawColumns, response: rawResponse, weights },
  };
}

function checkNames(names: readonly string[], response: string): void {
  const seen = new Set<string>();
  for (const name of names) {
    if (seen.has(name) || name === response) {
      throw new EstimationError(
        'duplicate-column',
        `column ${name} appears twice in the model`,
        name,
      );
    }
    seen.add(name);
  }
}

function positiveWeights(weights: NamedColumn, n: number): Float64Array {
  const values = finiteColumn(weights, n);
  values.forEach((w, i) => {
    if (!(w > 0)) {
      throw new EstimationError(
        'invalid-value',
        `column ${weights.name}, row ${i + 1}: weight ${w} is not positive`,
        weights.name,
      );
    }
  });
  return values;
}
