import { Rational } from '@shared/estimation/exact/rational';
import type {
  CrossProductSpec,
  Moments,
} from '@shared/estimation/least-squares/cross-product-moments';
import type { ShiftedSums } from './moment-pass';

/**
 * The sums Σz·zᵀ about another origin, exactly: with v' = v + δ (δ = old origin − new origin),
 * Σv'ₐv'_b = Σvₐv_b + δₐΣv_b + δ_bΣvₐ + δₐδ_b·Σ1.
 */
export function sumsAbout(sums: ShiftedSums, origin: readonly number[]): Rational[][] {
  const p = sums.products;
  const delta = [
    Rational.ZERO,
    ...sums.shifts.map((shift, j) =>
      Rational.fromNumber(shift).sub(Rational.fromNumber(origin[j])),
    ),
  ];
  // δ₀ = 0 for the constant, so the same formula gives Σv' = Σv + δ·Σ1 on the first row.
  return p.map((row, a) =>
    row.map((value, b) =>
      value
        .add(delta[a].mul(p[0][b]))
        .add(delta[b].mul(p[0][a]))
        .add(delta[a].mul(delta[b]).mul(p[0][0])),
    ),
  );
}

/**
 * The unweighted sums as solveFromCrossProducts takes them: the raw Σz·zᵀ over
 * z = [1, x…, y] (or [x…, y] without an intercept), exactly (as rationals).
 */
export function crossProductSpecOf(
  sums: ShiftedSums,
  names: { regressors: readonly string[]; response: string },
  options: { intercept: boolean; confidenceLevel?: number },
): CrossProductSpec {
  const raw = sumsAbout(
    sums,
    sums.shifts.map(() => 0),
  );
  const matrix = options.intercept ? raw : raw.slice(1).map((row) => row.slice(1));
  return {
    regressorNames: names.regressors,
    responseName: names.response,
    n: sums.n,
    crossProducts: matrix,
    intercept: options.intercept,
    confidenceLevel: options.confidenceLevel,
  };
}

/**
 * Exact moments about `origin` for solveNormalEquations: centred (with an intercept) or raw.
 * Weighted sums are rescaled by n/Σw — as if the weights summed to n — which leaves the
 * coefficients, the covariance s²·(XᵀWX)⁻¹ and R² unchanged; `scale` undoes it for RSS and TSS.
 */
export function momentsAbout(
  sums: ShiftedSums,
  origin: readonly number[],
  intercept: boolean,
): { moments: Moments; scale: Rational } {
  const p = sumsAbout(sums, origin);
  const k = p.length - 2;
  const total = p[0][0];
  const scale = Rational.of(BigInt(sums.n)).div(total);
  const entry = (a: number, b: number): Rational =>
    (intercept ? p[a][b].sub(p[0][a].mul(p[0][b]).div(total)) : p[a][b]).mul(scale);
  const means = intercept ? p[0].slice(1).map((v) => v.div(total)) : null;
  return {
    scale,
    moments: {
      gram: Array.from({ length: k }, (_, a) =>
        Array.from({ length: k }, (_, b) => entry(a + 1, b + 1)),
      ),
      cross: Array.from({ length: k }, (_, a) => entry(a + 1, k + 1)),
      responseSquares: entry(k + 1, k + 1),
      regressorMeans: means ? means.slice(0, k) : null,
      responseMean: means ? means[k] : null,
      exactInput: false,
    },
  };
}
