/**
 * Householder QR factorisation A = Q·[R; 0] of a tall matrix held as columns (each a
 * Float64Array of the n rows). Q is kept as its reflectors, so Qᵀ·v and Q·v cost O(n·k) and
 * no n×n matrix is ever formed. No column pivoting: a column that collapses is named by its own
 * position, which tells the caller which regressor depends on the ones before it.
 */
export class HouseholderQr {
  readonly rows: number;
  readonly cols: number;
  /** Reflector vectors; reflector j is zero above row j. */
  private readonly reflectors: Float64Array[];
  private readonly tau: Float64Array;
  /** R, upper triangular, stored by rows: r[i][j] for j ≥ i. */
  private readonly r: Float64Array[];

  constructor(columns: readonly Float64Array[]) {
    this.cols = columns.length;
    this.rows = columns[0]?.length ?? 0;
    const work = columns.map((column) => Float64Array.from(column));
    this.reflectors = work;
    this.tau = new Float64Array(this.cols);
    this.r = Array.from({ length: this.cols }, () => new Float64Array(this.cols));
    for (let j = 0; j < this.cols; j++) this.reflectColumn(work, j);
  }

  /** Entry (i, j) of R (zero below the diagonal). */
  rEntry(i: number, j: number): number {
    return j >= i ? this.r[i][j] : 0;
  }

  /** v ← Qᵀ·v, in place (v has n entries). */
  applyQTranspose(v: Float64Array): void {
    for (let j = 0; j < this.cols; j++) this.reflect(j, v);
  }

  /** v ← Q·v, in place. */
  applyQ(v: Float64Array): void {
    for (let j = this.cols - 1; j >= 0; j--) this.reflect(j, v);
  }

  /**
   * The k orthonormal columns of Q₁ (A = Q₁·R), formed by applying the reflectors to unit
   * vectors: orthonormal to rounding level however ill-conditioned A is.
   */
  thinQ(): Float64Array[] {
    return Array.from({ length: this.cols }, (_, j) => {
      const column = new Float64Array(this.rows);
      column[j] = 1;
      this.applyQ(column);
      return column;
    });
  }

  /** Solves R·x = c (c has k entries) by back substitution. */
  solveR(c: ArrayLike<number>): Float64Array {
    const x = Float64Array.from({ length: this.cols }, (_, i) => c[i]);
    for (let i = this.cols - 1; i >= 0; i--) {
      let s = x[i];
      for (let j = i + 1; j < this.cols; j++) s -= this.r[i][j] * x[j];
      x[i] = s / this.r[i][i];
    }
    return x;
  }

  /** Solves Rᵀ·x = c by forward substitution. */
  solveRTranspose(c: ArrayLike<number>): Float64Array {
    const x = Float64Array.from({ length: this.cols }, (_, i) => c[i]);
    for (let i = 0; i < this.cols; i++) {
      let s = x[i];
      for (let j = 0; j < i; j++) s -= this.r[j][i] * x[j];
      x[i] = s / this.r[i][i];
    }
    return x;
  }

  private reflectColumn(work: Float64Array[], j: number): void {
    const a = work[j];
    let norm = 0;
    for (let i = j; i < this.rows; i++) norm = Math.hypot(norm, a[i]);
    if (norm === 0) {
      this.tau[j] = 0;
      this.r[j][j] = 0;
      return;
    }
    // The sign opposite to a[j] avoids cancellation in v[j] = a[j] − alpha.
    const alpha = a[j] > 0 ? -norm : norm;
    const head = a[j] - alpha;
    this.tau[j] = -head / alpha;
    // Normalise the reflector to v[j] = 1, so H = I − tau·v·vᵀ.
    for (let i = j + 1; i < this.rows; i++) a[i] /= head;
    a[j] = 1;
    for (let i = 0; i < j; i++) a[i] = 0;
    this.r[j][j] = alpha;
    for (let c = j + 1; c < this.cols; c++) {
      this.reflect(j, work[c]);
      this.r[j][c] = work[c][j];
    }
  }

  private reflect(j: number, v: Float64Array): void {
    const tau = this.tau[j];
    if (tau === 0) return;
    const u = this.reflectors[j];
    let dot = 0;
    for (let i = j; i < this.rows; i++) dot += u[i] * v[i];
    const f = tau * dot;
    for (let i = j; i < this.rows; i++) v[i] -= f * u[i];
  }
}
