import { blockSchema } from './block';
import { blockKinds } from './block-kind';
import { freshBlockId, starterBlock } from './block-starters';

describe('starter blocks', () => {
  it.each(blockKinds)('starts a %s block that already passes validation', (kind) => {
    const result = blockSchema.safeParse(starterBlock(kind, 'new-block'));
    expect(result.error?.issues ?? []).toEqual([]);
  });

  it('hands out independent copies', () => {
    const first = starterBlock('price-ladder', 'a');
    const second = starterBlock('price-ladder', 'b');
    if (first.kind === 'price-ladder') first.pricesMinor.push(999);
    expect(second.kind === 'price-ladder' && second.pricesMinor).not.toContain(999);
  });

  it('numbers ids that are taken', () => {
    expect(freshBlockId('number', [])).toBe('number');
    expect(freshBlockId('number', ['number', 'number-2'])).toBe('number-3');
  });
});
