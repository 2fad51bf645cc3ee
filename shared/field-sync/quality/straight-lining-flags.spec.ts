import { starterBlock } from '../../questionnaire/block-starters';
import type { Block } from '../../questionnaire/block';
import { straightLiningFlags } from './straight-lining-flags';

const ladder = starterBlock('price-ladder', 'ladder'); // prices 100…300, yes/no
const intent = { ...starterBlock('price-ladder', 'intent'), scale: 'intent-5' } as Block;
const blocks = [starterBlock('consent', 'consent'), ladder, intent];
const steps = (responses: (string | number)[]) => ({
  steps: responses.map((response, i) => ({ priceMinor: 100 + 50 * i, response })),
});

describe('straightLiningFlags (limit: 4 or more prices with one answer)', () => {
  it('flags all yes across five prices', () => {
    const answers = { ladder: steps(['yes', 'yes', 'yes', 'yes', 'yes']) };
    expect(straightLiningFlags(blocks, answers)).toEqual([
      { kind: 'straight-lining', blockId: 'ladder', steps: 5, response: 'yes' },
    ]);
  });

  it('flags all no across four prices, and one intent level across four', () => {
    const answers = { ladder: steps(['no', 'no', 'no', 'no']), intent: steps([3, 3, 3, 3]) };
    expect(
      straightLiningFlags(blocks, answers).map((f) => f.kind === 'straight-lining' && f.blockId),
    ).toEqual(['ladder', 'intent']);
  });

  it('does not flag a ladder that ends at the first no, nor three equal answers', () => {
    expect(straightLiningFlags(blocks, { ladder: steps(['yes', 'yes', 'yes', 'no']) })).toEqual([]);
    expect(straightLiningFlags(blocks, { ladder: steps(['yes', 'yes', 'yes']) })).toEqual([]);
    expect(straightLiningFlags(blocks, { intent: steps([5, 4, 4, 4]) })).toEqual([]);
  });

  it('ignores ladders that were not answered', () => {
    expect(straightLiningFlags(blocks, {})).toEqual([]);
  });
});
