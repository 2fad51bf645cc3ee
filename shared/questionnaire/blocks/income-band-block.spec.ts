import { starterBlock } from '../block-starters';
import {
  type IncomeBandBlock,
  incomeBandAnswerSchema,
  incomeBandBlockSchema,
} from './income-band-block';

const block = starterBlock('income-band', 'income') as IncomeBandBlock;

describe('the income-band block', () => {
  it('accepts increasing bands with an open-ended last band', () => {
    expect(incomeBandBlockSchema.safeParse(block).success).toBe(true);
  });

  it('refuses overlapping bands and an open band before the last', () => {
    const bands = [
      { value: 'a', label: 'A', fromMinor: 0 },
      { value: 'b', label: 'B', fromMinor: 100, toMinor: 500 },
      { value: 'c', label: 'C', fromMinor: 400 },
    ];
    const result = incomeBandBlockSchema.safeParse({ ...block, bands });
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['bands.0.toMinor', 'Only the last band may be open-ended'],
      ['bands.2.fromMinor', 'Band 3 overlaps band 2'],
    ]);
  });

  it('refuses a band value used twice', () => {
    const bands = block.bands.map((b) => ({ ...b, value: 'same' }));
    const result = incomeBandBlockSchema.safeParse({ ...block, bands });
    expect(result.error?.issues[0]).toMatchObject({ path: ['bands', 1, 'value'] });
  });

  it('accepts a decline only when the block allows it', () => {
    expect(incomeBandAnswerSchema(block).safeParse({ band: null }).success).toBe(true);
    expect(
      incomeBandAnswerSchema({ ...block, allowDecline: false }).safeParse({ band: null }).success,
    ).toBe(false);
    expect(incomeBandAnswerSchema(block).safeParse({ band: 'middle' }).success).toBe(true);
    expect(incomeBandAnswerSchema(block).safeParse({ band: 'rich' }).success).toBe(false);
  });
});
