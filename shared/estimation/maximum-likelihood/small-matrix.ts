/**
 * Inverse of a small symmetric positive-definite matrix by Cholesky factorisation, or undefined
 * when the matrix is not (numerically) positive definite. Sized for 2–5 parameter likelihoods.
 */
export function invertPositiveDefinite(a: readonly (readonly number[])[]): number[][] | undefined {
  const p = a.length;
  const l = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  for (let i = 0; i < p; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i][j];
      for (let k = 0; k < j; k++) s -= l[i][k] * l[j][k];
      if (i === j) {
        if (!(s > 1e-14 * Math.abs(a[i][i]))) return undefined;
        l[i][i] = Math.sqrt(s);
      } else {
        l[i][j] = s / l[j][j];
      }
    }
  }
  const lInv = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  for (let col = 0; col < p; col++) {
    for (let i = col; i < p; i++) {
      let s = i === col ? 1 : 0;
      for (let k = col; k < i; k++) s -= l[i][k] * lInv[k][col];
      lInv[i][col] = s / l[i][i];
    }
  }
  return lInv.map((_, i) =>
    lInv.map((__, j) => {
      let s = 0;
      for (let k = Math.max(i, j); k < p; k++) s += lInv[k][i] * lInv[k][j];
      return s;
    }),
  );
}

/** y = A·x for a small dense matrix. */
export function multiplyMatrixVector(
  a: readonly (readonly number[])[],
  x: readonly number[],
): number[] {
  return a.map((row) => row.reduce((s, v, j) => s + v * x[j], 0));
}

/** Quadratic form gᵀ·A·g, the delta-method variance of a function with gradient g. */
export function quadraticForm(a: readonly (readonly number[])[], g: readonly number[]): number {
  return multiplyMatrixVector(a, g).reduce((s, v, i) => s + v * g[i], 0);
}
