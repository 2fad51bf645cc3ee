import { starterBlock } from '../../questionnaire/block-starters';
import { thresholdOrderFlags } from './threshold-order-flags';

const blocks = [starterBlock('consent', 'consent'), starterBlock('price-thresholds', 'psm')];
const answer = (tooCheap: number, cheap: number, expensive: number, tooExpensive: number) => ({
  psm: {
    tooCheapMinor: tooCheap,
    cheapMinor: cheap,
    expensiveMinor: expensive,
    tooExpensiveMinor: tooExpensive,
  },
});

describe('thresholdOrderFlags (too cheap ≤ cheap ≤ expensive ≤ too expensive, Van Westendorp)', () => {
  it('does not flag ordered answers, ties included', () => {
    expect(thresholdOrderFlags(blocks, answer(100, 200, 400, 600))).toEqual([]);
    expect(thresholdOrderFlags(blocks, answer(200, 200, 400, 400))).toEqual([]);
  });

  it('names each pair out of order: cheap above expensive', () => {
    expect(thresholdOrderFlags(blocks, answer(100, 500, 400, 600))).toEqual([
      {
        kind: 'thresholds-out-of-order',
        blockId: 'psm',
        violations: [{ lower: 'cheapMinor', higher: 'expensiveMinor' }],
      },
    ]);
  });

  it('lists every pair of a fully reversed answer (all six)', () => {
    const [flag] = thresholdOrderFlags(blocks, answer(600, 400, 200, 100));
    expect(flag.kind === 'thresholds-out-of-order' && flag.violations).toHaveLength(6);
  });
});
