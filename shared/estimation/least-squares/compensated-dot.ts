/**
 * Sums of products carried in double-double arithmetic (an unevaluated pair hi + lo, about 106
 * significant bits), using Knuth's two-sum and Dekker's two-product. Least-squares refinement
 * needs residuals far more accurate than the float64 data they come from; without them the
 * refinement cannot recover the digits a float64 QR loses on ill-conditioned designs.
 */

const SPLITTER = 134217729; // 2^27 + 1, Dekker's split constant for float64

/** A running double-double accumulator. */
export class CompensatedSum {
  private hi = 0;
  private lo = 0;

  constructor(initial = 0) {
    this.hi = initial;
  }

  /** Adds a float64 exactly (up to the accumulator's 106 bits). */
  add(value: number): void {
    const s = this.hi + value;
    const bp = s - this.hi;
    const err = this.hi - (s - bp) + (value - bp);
    this.renormalise(s, this.lo + err);
  }

  /** Adds the exact product a·b. */
  addProduct(a: number, b: number): void {
    const p = a * b;
    const ca = SPLITTER * a;
    const aHi = ca - (ca - a);
    const aLo = a - aHi;
    const cb = SPLITTER * b;
    const bHi = cb - (cb - b);
    const bLo = b - bHi;
    const err = aHi * bHi - p + aHi * bLo + aLo * bHi + aLo * bLo;
    this.add(p);
    this.lo += err;
  }

  /** The accumulated value rounded to float64. */
  value(): number {
    return this.hi + this.lo;
  }

  private renormalise(hi: number, lo: number): void {
    const s = hi + lo;
    this.lo = lo - (s - hi);
    this.hi = s;
  }
}

/** Σ a[i]·b[i] accumulated in double-double and rounded once. */
export function compensatedDot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const sum = new CompensatedSum();
  for (let i = 0; i < a.length; i++) sum.addProduct(a[i], b[i]);
  return sum.value();
}
