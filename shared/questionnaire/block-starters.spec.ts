import { type Block, blockSchema } from './block';
import { blockKinds } from './block-kind';
import { type StarterPriceRange, freshBlockId, starterBlock } from './block-starters';

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

/** The demo study's range: Ksh 500 to Ksh 4,000, in cents. */
const demo = { priceMinMinor: 50000, priceMaxMinor: 400000 };
/** A second range, $2.50 to $10.00, whose ends are not on a round step. */
const dollars = { priceMinMinor: 250, priceMaxMinor: 1000 };

function fitted<K extends Block['kind']>(kind: K, range: StarterPriceRange) {
  return starterBlock(kind, kind, range) as Extract<Block, { kind: K }>;
}

describe('starter blocks fitted to the study’s price range', () => {
  it.each([demo, dollars])('pass validation for every kind (%o)', (range) => {
    for (const kind of blockKinds) {
      const result = blockSchema.safeParse(starterBlock(kind, 'new-block', range));
      expect(result.error?.issues ?? []).toEqual([]);
    }
  });

  it('lays a ladder across the demo range in round amounts', () => {
    expect(fitted('price-ladder', demo).pricesMinor).toEqual([
      50000, 100000, 200000, 300000, 400000,
    ]);
  });

  it('lays a ladder across a range with uneven ends', () => {
    expect(fitted('price-ladder', dollars).pricesMinor).toEqual([250, 400, 600, 800, 1000]);
  });

  it('spreads the card below and above the demo range', () => {
    expect(fitted('payment-card', demo).amountsMinor).toEqual([
      25000, 100000, 200000, 300000, 400000, 500000, 600000,
    ]);
  });

  it('spreads the card below and above a range with uneven ends', () => {
    expect(fitted('payment-card', dollars).amountsMinor).toEqual([
      120, 250, 500, 750, 1000, 1250, 1500,
    ]);
  });

  it('offers bids across the range', () => {
    const bids = (range: StarterPriceRange) =>
      fitted('dichotomous-choice', range).bidDesign.levels.map((level) => level.bidMinor);
    expect(bids(demo)).toEqual([50000, 100000, 200000, 300000, 400000]);
    expect(bids(dollars)).toEqual([250, 400, 600, 800, 1000]);
  });

  it('caps open answers and thresholds at three times the highest price', () => {
    expect(fitted('wtp-open', demo)).toMatchObject({ minMinor: 0, maxMinor: 1200000 });
    expect(fitted('price-thresholds', demo).maxPriceMinor).toBe(1200000);
    expect(fitted('wtp-open', dollars).maxMinor).toBe(3000);
    expect(fitted('price-thresholds', dollars).maxPriceMinor).toBe(3000);
  });

  it('rounds an awkward top price up to a tidy cap', () => {
    const awkward = { priceMinMinor: 1234, priceMaxMinor: 4321 };
    expect(fitted('wtp-open', awkward).maxMinor).toBe(13000);
  });

  it('still gives a valid ladder for a range one unit wide', () => {
    const narrow = { priceMinMinor: 100, priceMaxMinor: 101 };
    expect(fitted('price-ladder', narrow).pricesMinor).toEqual([100, 101]);
    const card = fitted('payment-card', narrow).amountsMinor;
    expect(card[0]).toBeLessThan(100);
    expect(card.at(-1)).toBeGreaterThan(101);
  });

  it('stays within what can be stored for the widest range', () => {
    const widest = { priceMinMinor: 1, priceMaxMinor: Number.MAX_SAFE_INTEGER - 1 };
    for (const kind of ['price-ladder', 'payment-card', 'wtp-open', 'price-thresholds'] as const) {
      const result = blockSchema.safeParse(starterBlock(kind, kind, widest));
      expect(result.error?.issues ?? []).toEqual([]);
    }
  });

  it('keeps every list short whatever the range', () => {
    for (const range of [demo, dollars, { priceMinMinor: 1, priceMaxMinor: 9_000_000_000 }]) {
      expect(fitted('price-ladder', range).pricesMinor.length).toBeLessThanOrEqual(6);
      expect(fitted('payment-card', range).amountsMinor.length).toBeLessThanOrEqual(8);
      expect(fitted('dichotomous-choice', range).bidDesign.levels.length).toBeLessThanOrEqual(5);
    }
  });

  it('leaves blocks without money, and ranges that make no sense, to the plain starters', () => {
    expect(starterBlock('text', 'text', demo)).toEqual(starterBlock('text', 'text'));
    const upsideDown = { priceMinMinor: 400000, priceMaxMinor: 50000 };
    expect(starterBlock('price-ladder', 'p', upsideDown)).toEqual(
      starterBlock('price-ladder', 'p'),
    );
  });
});
