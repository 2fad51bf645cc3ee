import { largest, smallest } from '../numerics/extent';
import { dyadicColumn, shiftLeft, type DyadicColumn } from '../exact/dyadic-column';
import { exactLinearSolve } from '../exact/exact-linear-solve';
import { fractionToNumber, Rational } from '../exact/rational';

/** A design as the data give it: columns and response unweighted, weights apart. */
export interface RawDesign {
  /** The regressors X (for two-stage least squares the actual, not the fitted, values). */
  readonly columns: readonly Float64Array[];
  readonly response: Float64Array;
  /** Positive analytic weights, or null. */
  readonly weights: Float64Array | null;
  /**
   * Two-stage least squares: every instrument column Z (the exogenous regressors included);
   * the bread is then X̂ = Z·(ZᵀWZ)⁻¹·ZᵀWX (see exactInstrumental).
   */
  readonly instruments?: readonly Float64Array[];
}

/** The exact least-squares fit of float64 data, each figure rounded once to float64. */
export interface ExactLeastSquares {
  readonly coefficients: Float64Array;
  /** y − X·β, unweighted. */
  readonly rawResiduals: Float64Array;
  readonly residualSumOfSquares: number;
  readonly inverseGram: number[][];
  /** (XᵀWX)⁻¹·M·(XᵀWX)⁻¹ with M = Σ_g s_g·s_gᵀ, s_g = Σ_{i∈g} wᵢeᵢxᵢ (rows when no groups). */
  sandwich(groups: readonly number[] | null): number[][];
}

/** Rows × products that the exact path accepts: beyond, its BigInt sums take seconds. */
export const EXACT_WORK_LIMIT = 1_000_000;

/** Whether a design of n rows and k columns is small enough for exactLeastSquares. */
export function exactPathFits(n: number, k: number): boolean {
  return (n * k * (k + 1)) / 2 <= EXACT_WORK_LIMIT;
}

export function rational(integer: bigint, exponent: number): Rational {
  return exponent >= 0
    ? Rational.of(integer << BigInt(exponent))
    : Rational.of(integer, 1n << BigInt(-exponent));
}

/** The nearest float64 to integer·2^exponent/denominator. */
export function roundScaled(integer: bigint, exponent: number, denominator: bigint): number {
  return exponent >= 0
    ? fractionToNumber(integer << BigInt(exponent), denominator)
    : fractionToNumber(integer, denominator << BigInt(-exponent));
}

/**
 * Weighted least squares in exact arithmetic: every float64 is a dyadic rational, so XᵀWX and
 * XᵀWy are exact BigInt sums, the normal equations are solved exactly (Bareiss), the residuals
 * follow exactly from the exact β, and the sandwich's meat is summed exactly from them. Nothing
 * is rounded until each reported figure, so the conditioning of the design costs no digits; the
 * price is BigInt arithmetic, which `exactPathFits` keeps to small designs.
 */
export function exactLeastSquares(design: RawDesign, names: readonly string[]): ExactLeastSquares {
  const x = design.columns.map(dyadicColumn);
  const y = dyadicColumn(design.response);
  const w = design.weights ? dyadicColumn(design.weights) : null;
  const n = design.response.length;
  const k = x.length;
  const wx = x.map((column) =>
    w
      ? {
          integers: column.integers.map((v, i) => v * w.integers[i]),
          exponent: column.exponent + w.exponent,
        }
      : column,
  );
  const gram = wx.map((a) => x.map((b) => rational(sum(a, b, n), a.exponent + b.exponent)));
  const cross = wx.map((a) => rational(sum(a, y, n), a.exponent + y.exponent));
  const solved = exactLinearSolve(gram, cross, names);
  const den = solved.denominator;
  const base = Math.min(y.exponent, ...x.map((c) => c.exponent));
  // r_i = numerators[i]·2^base / den, exactly.
  const numerators = Array.from({ length: n }, (_, i) => {
    let value = shiftLeft(y.integers[i], y.exponent - base) * den;
    x.forEach((column, j) => {
      value -= shiftLeft(column.integers[i], column.exponent - base) * solved.solution[j];
    });
    return value;
  });
  const weightExponent = w ? w.exponent : 0;
  const weightOf = (i: number): bigint => (w ? w.integers[i] : 1n);
  let rss = 0n;
  numerators.forEach((value, i) => (rss += weightOf(i) * value * value));
  return {
    coefficients: Float64Array.from(solved.solution, (value) => fractionToNumber(value, den)),
    rawResiduals: Float64Array.from(numerators, (value) => roundScaled(value, base, den)),
    residualSumOfSquares: roundScaled(rss, weightExponent + 2 * base, den * den),
    inverseGram: solved.inverse.map((row) => row.map((value) => fractionToNumber(value, den))),
    sandwich(groups) {
      // Score totals t_ga = Σ_{i∈g} Wᵢ·Nᵢ·X_ia; the true total is t_ga·2^(w + base + e_a)/den.
      const count = groups ? largest(groups) + 1 : n;
      const totals = Array.from({ length: count }, () => new Array<bigint>(k).fill(0n));
      numerators.forEach((value, i) => {
        const score = weightOf(i) * value;
        const total = totals[groups ? groups[i] : i];
        x.forEach((column, a) => (total[a] += score * column.integers[i]));
      });
      const meat = Array.from({ length: k }, (_, a) =>
        Array.from({ length: k }, (_, b) => {
          if (b < a) return 0n;
          let value = 0n;
          for (const total of totals) value += total[a] * total[b];
          return value;
        }),
      );
      for (let a = 0; a < k; a++) for (let b = 0; b < a; b++) meat[a][b] = meat[b][a];
      // V = I·M·Iᵀ/den² with the column exponents folded into I: Ĩ_ac = I_ac·2^(e_c − low).
      const low = smallest(x.map((c) => c.exponent));
      const inverse = solved.inverse.map((row) =>
        row.map((value, c) => shiftLeft(value, x[c].exponent - low)),
      );
      const left = inverse.map((row) =>
        Array.from({ length: k }, (_, b) =>
          row.reduce((s, value, c) => s + value * meat[c][b], 0n),
        ),
      );
      const exponent = 2 * (low + weightExponent + base);
      const den4 = den * den * den * den;
      return left.map((row) =>
        inverse.map((other) =>
          roundScaled(
            row.reduce((s, value, c) => s + value * other[c], 0n),
            exponent,
            den4,
          ),
        ),
      );
    },
  };
}

function sum(a: DyadicColumn, b: DyadicColumn, n: number): bigint {
  let total = 0n;
  for (let i = 0; i < n; i++) total += a.integers[i] * b.integers[i];
  return total;
}
