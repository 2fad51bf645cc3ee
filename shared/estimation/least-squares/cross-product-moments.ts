import { EstimationError } from '../estimation-error';
import { Rational } from '../exact/rational';

/**
 * A sum as the database returns it: a float64, or an exact decimal string (numeric) — or, from
 * code that already holds it exactly, a Rational (taken as exact, like a decimal string).
 */
export type SumValue = number | string | Rational;

/** The sums a least-squares fit needs, as the database computes them. */
export interface CrossProductSpec {
  /** Names of the regressors x₁…x_k, in the order of the matrix. */
  readonly regressorNames: readonly string[];
  readonly responseName: string;
  /** Number of observations. */
  readonly n: number;
  /**
   * Symmetric matrix of sums of products:
   * - intercept, no `means`: Σ z·zᵀ over z = [1, x₁…x_k, y], (k+2)×(k+2), entry [0][0] = n;
   * - intercept with `means`: the centred Σ (w − w̄)(w − w̄)ᵀ over w = [x₁…x_k, y], (k+1)×(k+1);
   * - no intercept: the raw Σ w·wᵀ over w = [x₁…x_k, y], (k+1)×(k+1).
   */
  readonly crossProducts: readonly (readonly SumValue[])[];
  /** [x̄₁…x̄_k, ȳ] when `crossProducts` is centred. */
  readonly means?: readonly SumValue[];
  /** Default true. */
  readonly intercept?: boolean;
  readonly confidenceLevel?: number;
  /** Refuse float64 sums whose scaled cross-product matrix exceeds this condition number. */
  readonly maxConditionNumber?: number;
}

/** Exact centred (or, without intercept, raw) moments: S = XᵀX, s = Xᵀy, syy = yᵀy. */
export interface Moments {
  readonly gram: Rational[][];
  readonly cross: Rational[];
  readonly responseSquares: Rational;
  /** x̄ and ȳ with an intercept; null without. */
  readonly regressorMeans: Rational[] | null;
  readonly responseMean: Rational | null;
  /** True when every sum was an exact decimal string. */
  readonly exactInput: boolean;
}

/** Checks the shape and values of the sums and brings them exactly to centred form. */
export function crossProductMoments(spec: CrossProductSpec): Moments {
  const k = spec.regressorNames.length;
  const intercept = spec.intercept ?? true;
  const raw = intercept && spec.means === undefined;
  const parameters = k + (intercept ? 1 : 0);
  if (!Number.isInteger(spec.n) || spec.n <= parameters) {
    throw new EstimationError(
      'too-few-observations',
      `n = ${spec.n} observations cannot estimate ${parameters} coefficients with residual ` +
        `degrees of freedom`,
      'n',
    );
  }
  if (!intercept && spec.means !== undefined) {
    throw new EstimationError(
      'invalid-option',
      'means apply only to a model with an intercept',
      'means',
    );
  }
  const m = exactMatrix(spec.crossProducts, k + (raw ? 2 : 1));
  const exactInput = [...spec.crossProducts.flat(), ...(spec.means ?? [])].every(
    (v) => typeof v === 'string' || v instanceof Rational,
  );
  if (raw) return { ...centreRaw(m, spec.n, k), exactInput };
  const moments = {
    gram: m.slice(0, k).map((row) => row.slice(0, k)),
    cross: m.slice(0, k).map((row) => row[k]),
    responseSquares: m[k][k],
    exactInput,
  };
  if (!intercept) return { ...moments, regressorMeans: null, responseMean: null };
  const means = exactMeans(spec.means!, k);
  return { ...moments, regressorMeans: means.slice(0, k), responseMean: means[k] };
}

/** S_ij = Σxᵢxⱼ − (Σxᵢ)(Σxⱼ)/n, exactly. */
function centreRaw(m: Rational[][], n: number, k: number): Omit<Moments, 'exactInput'> {
  if (m[0][0].sub(Rational.of(BigInt(n))).num !== 0n) {
    throw new EstimationError('invalid-value', `entry [0][0] must equal n = ${n}`, 'crossProducts');
  }
  const count = Rational.of(BigInt(n));
  const centred = (i: number, j: number): Rational => m[i][j].sub(m[0][i].mul(m[0][j]).div(count));
  return {
    gram: Array.from({ length: k }, (_, i) =>
      Array.from({ length: k }, (_, j) => centred(i + 1, j + 1)),
    ),
    cross: Array.from({ length: k }, (_, i) => centred(i + 1, k + 1)),
    responseSquares: centred(k + 1, k + 1),
    regressorMeans: Array.from({ length: k }, (_, i) => m[0][i + 1].div(count)),
    responseMean: m[0][k + 1].div(count),
  };
}

function exactMatrix(matrix: readonly (readonly SumValue[])[], size: number): Rational[][] {
  if (matrix.length !== size || matrix.some((row) => row.length !== size)) {
    throw new EstimationError(
      'invalid-value',
      `the cross-product matrix must be ${size}×${size} for these regressors`,
      'crossProducts',
    );
  }
  return matrix.map((row, i) => row.map((value, j) => exact(value, `crossProducts[${i}][${j}]`)));
}

function exactMeans(means: readonly SumValue[], k: number): Rational[] {
  if (means.length !== k + 1) {
    throw new EstimationError('invalid-value', `means must hold ${k + 1} values (x̄…, ȳ)`, 'means');
  }
  return means.map((value, i) => exact(value, `means[${i}]`));
}

function exact(value: SumValue, where: string): Rational {
  if (value instanceof Rational) return value;
  try {
    return typeof value === 'string' ? Rational.fromDecimal(value) : Rational.fromNumber(value);
  } catch {
    throw new EstimationError(
      'invalid-value',
      `${where} is ${String(value)}, not a number`,
      'crossProducts',
    );
  }
}
