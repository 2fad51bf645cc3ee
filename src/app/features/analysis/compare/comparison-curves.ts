import type { BandedCurve, CurvePoint } from '../charts/banded-curve';

/** How curves of different kinds are put on one axis. */
export type ComparisonScale = 'as-estimated' | 'indexed';

/** True when the curves measure different things (quantities and shares) and need an index. */
export function mixedKinds(curves: readonly BandedCurve[]): boolean {
  return new Set(curves.map((c) => c.quantityKind)).size > 1;
}

/** The curve's estimate at a price, by linear interpolation between its points. */
export function estimateAt(curve: BandedCurve, price: number): number | null {
  const points = curve.points;
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1], points[i]];
    if (a.price <= price && price <= b.price) {
      const t = b.price === a.price ? 0 : (price - a.price) / (b.price - a.price);
      return a.estimate + t * (b.estimate - a.estimate);
    }
  }
  return null;
}

/**
 * Curves on a common scale. Indexed, each curve (and its band, by the same factor) is divided by
 * its own estimate at the reference price and multiplied by 100, so quantities and purchase
 * shares compare by shape: how fast demand falls as the price moves away from the reference.
 * A curve with no positive estimate at the reference price is left out.
 */
export function comparisonCurves(
  curves: readonly BandedCurve[],
  scale: ComparisonScale,
  referencePrice: number,
): BandedCurve[] {
  if (scale === 'as-estimated') return [...curves];
  return curves.flatMap((curve) => {
    const base = estimateAt(curve, referencePrice);
    if (base === null || !(base > 0)) return [];
    const factor = 100 / base;
    const scaled = (v: number | null) => (v === null ? null : v * factor);
    const points = curve.points.map(
      (p): CurvePoint => ({
        price: p.price,
        estimate: p.estimate * factor,
        low: scaled(p.low),
        high: scaled(p.high),
      }),
    );
    return [{ ...curve, points }];
  });
}
