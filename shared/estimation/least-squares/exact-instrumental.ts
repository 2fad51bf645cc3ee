import { largest } from '../numerics/extent';
import { commonDyadic } from '../exact/dyadic-column';
import { exactLinearSolve } from '../exact/exact-linear-solve';
import { fractionToNumber, Rational } from '../exact/rational';
import { roundScaled, type ExactLeastSquares, type RawDesign } from './exact-least-squares';

/**
 * Two-stage least squares in exact arithmetic. With A = ZᵀWZ, B = ZᵀWX, c = ZᵀWy (exact
 * BigInt sums of the float64 data), β = (BᵀA⁻¹B)⁻¹BᵀA⁻¹c solves the saddle-point system
 * [[A, B], [Bᵀ, 0]]·[λ; β] = [c; 0], whose exact inverse also holds the two blocks the
 * covariances need: −(X̂ᵀWX̂)⁻¹ bottom right, and H = A⁻¹B·(X̂ᵀWX̂)⁻¹ top right, with which the
 * sandwich is Hᵀ·M_Z·H for the meat M_Z summed from wᵢuᵢzᵢ (u the structural residuals). The
 * fitted X̂ is never rounded, so the result is exact to the last digit reported.
 */
export function exactInstrumental(design: RawDesign, names: readonly string[]): ExactLeastSquares {
  const z = design.instruments!;
  const m = z.length;
  const k = design.columns.length;
  const n = design.response.length;
  const all = commonDyadic([...z, ...design.columns, design.response]);
  const zi = all.integers.slice(0, m);
  const xi = all.integers.slice(m, m + k);
  const yi = all.integers[m + k];
  const w = design.weights ? commonDyadic([design.weights]) : null;
  const weightOf = (i: number): bigint => (w ? w.integers[0][i] : 1n);
  const weightExponent = w ? w.exponent : 0;
  const wz = zi.map((column) => column.map((v, i) => v * weightOf(i)));
  const dot = (a: bigint[], b: bigint[]): bigint => {
    let total = 0n;
    for (let i = 0; i < n; i++) total += a[i] * b[i];
    return total;
  };
  // All of A, B, c carry the factor 2^(w + 2e); it cancels from β, so the integers are solved.
  const a = wz.map((row) => zi.map((column) => dot(row, column)));
  const b = wz.map((row) => xi.map((column) => dot(row, column)));
  const c = wz.map((row) => dot(row, yi));
  const saddle = [
    ...a.map((row, r) => [...row, ...b[r]]),
    ...Array.from({ length: k }, (_, j) => [
      ...b.map((row) => row[j]),
      ...new Array<bigint>(k).fill(0n),
    ]),
  ].map((row) => row.map((v) => Rational.of(v)));
  const rhs = [...c, ...new Array<bigint>(k).fill(0n)].map((v) => Rational.of(v));
  const instrumentNames = z.map((_, j) => `instrument ${j + 1}`);
  const solved = exactLinearSolve(saddle, rhs, [...instrumentNames, ...names]);
  const d = solved.denominator;
  const beta = solved.solution.slice(m);
  // u_i = 2^e·N_i/d exactly.
  const numerators = Array.from({ length: n }, (_, i) => {
    let value = yi[i] * d;
    xi.forEach((column, j) => (value -= column[i] * beta[j]));
    return value;
  });
  const scale = weightExponent + 2 * all.exponent;
  let rss = 0n;
  numerators.forEach((value, i) => (rss += weightOf(i) * value * value));
  const h = solved.inverse.slice(0, m).map((row) => row.slice(m));
  return {
    coefficients: Float64Array.from(beta, (value) => fractionToNumber(value, d)),
    rawResiduals: Float64Array.from(numerators, (value) => roundScaled(value, all.exponent, d)),
    residualSumOfSquares: roundScaled(rss, weightExponent + 2 * all.exponent, d * d),
    inverseGram: solved.inverse
      .slice(m)
      .map((row) => row.slice(m).map((value) => roundScaled(-value, -scale, d))),
    sandwich(groups) {
      // T_g = Σ_{i∈g} Wᵢ·Nᵢ·Zᵢ; with H's and the meat's powers of two, V = HᵀM′H/d⁴ exactly.
      const count = groups ? largest(groups) + 1 : n;
      const totals = Array.from({ length: count }, () => new Array<bigint>(m).fill(0n));
      numerators.forEach((value, i) => {
        const score = weightOf(i) * value;
        const total = totals[groups ? groups[i] : i];
        zi.forEach((column, r) => (total[r] += score * column[i]));
      });
      const meat = Array.from({ length: m }, (_, r) =>
        Array.from({ length: m }, (_, s) => {
          let value = 0n;
          for (const total of totals) value += total[r] * total[s];
          return value;
        }),
      );
      const left = Array.from({ length: k }, (_, p) =>
        Array.from({ length: m }, (_, s) =>
          h.reduce((sum, row, r) => sum + row[p] * meat[r][s], 0n),
        ),
      );
      const d4 = d * d * d * d;
      return left.map((row) =>
        Array.from({ length: k }, (_, q) =>
          fractionToNumber(
            row.reduce((sum, value, s) => sum + value * h[s][q], 0n),
            d4,
          ),
        ),
      );
    },
  };
}
