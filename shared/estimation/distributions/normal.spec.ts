import { readFileSync } from 'node:fs';
import { normalCdf, normalQuantile } from './normal';

// CHECKS.md §3, transcribed to tests/fixtures/checks/quantiles.json.
const checks = JSON.parse(
  readFileSync(new URL('../../../tests/fixtures/checks/quantiles.json', import.meta.url), 'utf8'),
) as { z: { p: number; expected: number; tolerance: number; label: string }[] };

describe('normalQuantile', () => {
  it.each(checks.z)('gives z($p) = $expected ($label)', ({ p, expected, tolerance }) => {
    expect(Math.abs(normalQuantile(p) - expected) / expected).toBeLessThan(tolerance);
  });

  it('is antisymmetric about ½ and inverts normalCdf (properties of Φ)', () => {
    for (const p of [0.001, 0.05, 0.3]) {
      expect(normalQuantile(p)).toBeCloseTo(-normalQuantile(1 - p), 12);
      expect(normalCdf(normalQuantile(p))).toBeCloseTo(p, 14);
    }
  });
});
