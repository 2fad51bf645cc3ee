import { readFileSync } from 'node:fs';
import { tCdf, tQuantile } from './student-t';

interface QuantileCheck {
  p: number;
  df: number;
  expected: number;
  tolerance: number;
  label: string;
}

// CHECKS.md §3, transcribed to tests/fixtures/checks/quantiles.json with each value's label.
const checks = JSON.parse(
  readFileSync(new URL('../../../tests/fixtures/checks/quantiles.json', import.meta.url), 'utf8'),
) as { t: QuantileCheck[] };

describe('tQuantile', () => {
  it.each(checks.t)('gives t($p, $df) = $expected ($label)', ({ p, df, expected, tolerance }) => {
    expect(Math.abs(tQuantile(p, df) - expected) / expected).toBeLessThan(tolerance);
  });

  it('agrees with the ν = 1 closed form tan(π(p − ½)) across the range (published closed form)', () => {
    for (const p of [0.6, 0.8, 0.9, 0.99, 0.999]) {
      const closedForm = Math.tan(Math.PI * (p - 0.5));
      expect(Math.abs(tQuantile(p, 1) - closedForm) / closedForm).toBeLessThan(1e-12);
    }
  });

  it('round-trips through tCdf (CHECKS.md §3: 16 digits for stdlib)', () => {
    for (const df of [1, 2, 5, 30, 300]) {
      for (const p of [0.025, 0.5, 0.9, 0.995])
        expect(tCdf(tQuantile(p, df), df)).toBeCloseTo(p, 14);
    }
  });
});
