import { surveyWeighting as sw } from '../../../tests/fixtures/checks/survey-weighting';
import { kishDesignEffect } from './design-effect';
import { postStratify } from './post-stratification';
import { rake } from './raking';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const ps = sw.postStratification;
const cells = ['a', 'b', 'c'] as const;
const strata = cells.flatMap((c) => new Array<string>(ps.counts[c]).fill(c));
// Within each cell, the first yesRate·count respondents say yes.
const yes: number[] = cells.flatMap((c) =>
  Array.from({ length: ps.counts[c] }, (_, i) => (i < ps.yesRates[c] * ps.counts[c] ? 1 : 0)),
);

describe('postStratify (CHECKS.md §9)', () => {
  const result = postStratify({ strata, targets: ps.shares });

  it('gives the cell weights 0.6, 1.3333 and 1.5', () => {
    // CHECKS.md §9, published (Kish 1965).
    for (const c of cells) expect(result.cellFactors[c]).toBeCloseTo(ps.weights[c], 12);
    expect(result.weights.reduce((s, w) => s + w, 0)).toBeCloseTo(100, 10);
  });

  it('moves the yes-rate from 0.51 unweighted to 0.47 weighted', () => {
    // CHECKS.md §9.
    const unweighted = yes.reduce((s, y) => s + y, 0) / yes.length;
    const weighted = yes.reduce((s, y, i) => s + y * result.weights[i], 0) / 100;
    expect(unweighted).toBeCloseTo(ps.unweightedYes, 12);
    expect(weighted).toBeCloseTo(ps.weightedYes, 12);
  });

  it('accepts population totals as well as shares', () => {
    const totals = postStratify({ strata, targets: { a: 3000, b: 4000, c: 3000 } });
    expect(totals.weights).toEqual(result.weights);
  });

  it('refuses a stratum with a target but no respondent, and one with no target', () => {
    expect(
      refusalOf(() => postStratify({ strata, targets: { ...ps.shares, d: 0.1 } })),
    ).toMatchObject({ code: 'empty-cell', field: 'stratum' });
    expect(refusalOf(() => postStratify({ strata, targets: { a: 0.5, b: 0.5 } }))).toMatchObject({
      code: 'missing-target',
      field: 'stratum',
    });
    expect(refusalOf(() => postStratify({ strata: [], targets: ps.shares }))).toMatchObject({
      code: 'too-few-observations',
    });
  });
});

describe('kishDesignEffect (CHECKS.md §9)', () => {
  it('gives deff 1.163333 and effective sample size 85.959885 for the post-stratified weights', () => {
    // CHECKS.md §9, published: Kish (1992); printed to 7–8 digits.
    const weights = postStratify({ strata, targets: ps.shares }).weights;
    const deff = kishDesignEffect(weights);
    expect(Math.abs(deff.designEffect - sw.kish.designEffect)).toBeLessThan(
      sw.kish.printedTolerance,
    );
    expect(Math.abs(deff.effectiveSampleSize - sw.kish.effectiveSampleSize)).toBeLessThan(
      sw.kish.printedTolerance,
    );
    // Exact relation deff = n·Σw²/(Σw)² with Σw² = 116.3333…, and deff = 1 + CV².
    expect(deff.designEffect).toBeCloseTo(
      (100 * (50 * 0.36 + (30 * 16) / 9 + 20 * 2.25)) / 10000,
      12,
    );
    expect(deff.weightCv ** 2 + 1).toBeCloseTo(deff.designEffect, 12);
  });

  it('gives deff 1 for equal weights and refuses a zero weight', () => {
    expect(kishDesignEffect([2, 2, 2]).designEffect).toBe(1);
    expect(refusalOf(() => kishDesignEffect([1, 0]))).toMatchObject({
      code: 'invalid-value',
      field: 'weight',
    });
  });
});

describe('rake (CHECKS.md §9)', () => {
  const r = sw.raking;
  const rows: string[] = [];
  const columns: string[] = [];
  r.sample.forEach((row, i) =>
    row.forEach((count, j) => {
      for (let k = 0; k < count; k++) {
        rows.push(`r${i}`);
        columns.push(`c${j}`);
      }
    }),
  );
  const targets = {
    row: { r0: r.rowTargets[0], r1: r.rowTargets[1] },
    column: { c0: r.columnTargets[0], c1: r.columnTargets[1] },
  };

  it('converges to the fitted table and the cell weights of the worked example', () => {
    // CHECKS.md §9, published (Deming & Stephan 1940); values computed there, tolerance 1e-9.
    const result = rake({ variables: { row: rows, column: columns }, targets });
    expect(result.maxMarginError).toBeLessThanOrEqual(1e-12);
    expect(result.iterations).toBeGreaterThan(1);
    r.sample.forEach((row, i) =>
      row.forEach((_, j) => {
        const k = rows.findIndex((v, idx) => v === `r${i}` && columns[idx] === `c${j}`);
        expect(Math.abs(result.weights[k] - r.cellWeights[i][j])).toBeLessThan(r.tolerance);
        const cellTotal = result.weights
          .filter((__, idx) => rows[idx] === `r${i}` && columns[idx] === `c${j}`)
          .reduce((s, w) => s + w, 0);
        expect(Math.abs(cellTotal - r.fitted[i][j])).toBeLessThan(r.tolerance);
      }),
    );
    const m11 = result.weights
      .filter((_, idx) => rows[idx] === 'r0' && columns[idx] === 'c0')
      .reduce((s, w) => s + w, 0);
    // Closed form (115 − √2425)/2, the odds-ratio property (from memory: Bishop, Fienberg & Holland).
    expect(Math.abs(m11 - r.m11ClosedForm)).toBeLessThan(r.tolerance);
  });

  it('reports not-converged when the margins cannot be met', () => {
    // Row and column are the same split in the sample, so row shares 0.5/0.5 and column shares 0.3/0.7 conflict.
    const same = ['x', 'x', 'y', 'y'];
    expect(
      refusalOf(() =>
        rake({
          variables: { row: same, column: same },
          targets: { row: { x: 0.5, y: 0.5 }, column: { x: 0.3, y: 0.7 } },
          maxIterations: 50,
        }),
      ),
    ).toMatchObject({ code: 'not-converged', field: 'targets' });
  });

  it('refuses a margin variable that is missing', () => {
    expect(refusalOf(() => rake({ variables: { row: rows }, targets }))).toMatchObject({
      code: 'missing-column',
      field: 'column',
    });
  });
});
