import { EstimationError } from '../estimation-error';
import { analysePriceLadder } from '../price-ladder/price-ladder';
import { analyseOpenEndedWtp } from '../willingness-to-pay/open-ended-wtp';
import { buildDemandSchedule } from './demand-schedule';
import { demandScheduleSchema } from './demand-schedule-schema';
import { linearRegressionDemand, logLogRegressionDemand } from './regression-demand-curves';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const linear = linearRegressionDemand({
  intercept: 100,
  priceCoefficient: -2,
  covariance: [
    [4, -0.15],
    [-0.15, 0.01],
  ],
  dfResidual: 10,
  observedPriceRange: { min: 10, max: 30 },
  n: 12,
});

describe('buildDemandSchedule', () => {
  const schedule = buildDemandSchedule(linear, { from: 0, to: 40, steps: 5 });

  it('tabulates quantity, revenue and elasticity on the grid', () => {
    // Q = 100 − 2P: at 20, Q = 60, revenue 1200, ε = −2/3 (CHECKS.md §8, textbook).
    const at20 = schedule.rows.find((r) => r.price === 20)!;
    expect(at20.quantity).toBe(60);
    expect(at20.revenue).toBe(1200);
    expect(at20.elasticity).toBeCloseTo(-2 / 3, 12);
    expect(schedule.n).toBe(12);
  });

  it('gives a t band for the mean prediction', () => {
    // Computed here by hand: var = 4 − 2·0.15·20 + 0.01·400 = 2, t(0.975, 10) = 2.2281388519862744 (CHECKS.md §3).
    const at20 = schedule.rows.find((r) => r.price === 20)!;
    expect(at20.ciHigh! - 60).toBeCloseTo(2.2281388519862744 * Math.sqrt(2), 10);
    expect(60 - at20.ciLow!).toBeCloseTo(2.2281388519862744 * Math.sqrt(2), 10);
  });

  it('flags prices outside the fitted range as extrapolation', () => {
    expect(schedule.rows.map((r) => [r.price, r.extrapolated])).toEqual([
      [0, true],
      [10, false],
      [20, false],
      [30, false],
      [40, true],
    ]);
  });

  it('gives no elasticity at price 0', () => {
    expect(schedule.rows[0].elasticity).toBeNull();
  });

  it('tabulates a price-ladder purchase curve with a band around each share', () => {
    const answers = ['a', 'b', 'c', 'd', 'e'].flatMap((respondent, r) =>
      [10, 20, 30].map((price, k) => ({ respondent, price, buy: k <= r % 3 ? 1 : 0 })),
    );
    const ladder = analysePriceLadder({ answers });
    const table = buildDemandSchedule(ladder.curve, { prices: [5, 15, 25, 35] });
    expect(table.quantityKind).toBe('share');
    table.rows.forEach((row) => {
      expect(row.ciLow!).toBeLessThanOrEqual(row.quantity);
      expect(row.ciHigh!).toBeGreaterThanOrEqual(row.quantity);
    });
    expect(table.rows.map((r) => r.extrapolated)).toEqual([true, false, false, true]);
  });

  it('gives a step curve no elasticity and no band', () => {
    const wtp = analyseOpenEndedWtp({ wtp: [0, 5, 10, 20], replicates: 10 });
    const table = buildDemandSchedule(wtp.curve, { prices: [1, 6] });
    expect(table.rows.map((r) => [r.quantity, r.elasticity, r.ciLow])).toEqual([
      [0.75, null, null],
      [0.5, null, null],
    ]);
  });

  it('gives a log-log curve its constant elasticity and a band on the log scale', () => {
    const ce = logLogRegressionDemand({
      intercept: 5,
      priceCoefficient: -1.4,
      covariance: [
        [0.04, 0],
        [0, 0.01],
      ],
      observedPriceRange: { min: 1, max: 5 },
      n: 30,
    });
    const row = buildDemandSchedule(ce, { prices: [1] }).rows[0];
    expect(row.elasticity).toBe(-1.4);
    // At P = 1 only the intercept varies: exp(5 ± 1.959963984540054·0.2), z from CHECKS.md §3.
    expect(row.ciHigh).toBeCloseTo(Math.exp(5 + 1.959963984540054 * 0.2), 9);
  });

  it('refuses a grid that does not increase or has one step', () => {
    expect(() => buildDemandSchedule(linear, { prices: [10, 10] })).toThrow(EstimationError);
    expect(
      refusalOf(() => buildDemandSchedule(linear, { from: 1, to: 2, steps: 1 })),
    ).toMatchObject({ code: 'invalid-value', field: 'grid' });
  });
});

describe('demandScheduleSchema', () => {
  const good = buildDemandSchedule(linear, { prices: [10, 20] });

  it('accepts a built schedule', () => {
    expect(demandScheduleSchema.safeParse(good).success).toBe(true);
  });

  it('rejects falling prices, a band that misses the prediction and a missing n', () => {
    const swapped = { ...good, rows: [good.rows[1], good.rows[0]] };
    expect(demandScheduleSchema.safeParse(swapped).success).toBe(false);
    const badBand = { ...good, rows: [{ ...good.rows[0], ciLow: 1000, ciHigh: 2000 }] };
    expect(demandScheduleSchema.safeParse(badBand).success).toBe(false);
    const noN: Record<string, unknown> = { ...good };
    delete noN['n'];
    expect(demandScheduleSchema.safeParse(noN).success).toBe(false);
  });
});
