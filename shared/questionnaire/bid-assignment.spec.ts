import { assignBid, stableSiteHash } from './bid-assignment';

const design = { levels: [100, 200, 300, 400].map((bidMinor) => ({ bidMinor })) };

describe('assignBid', () => {
  it('uses every bid exactly once in each run of as many respondents as there are bids', () => {
    for (const site of ['kiosk-07', 'market-east', 'household-112']) {
      for (let start = 0; start < 8; start += 4) {
        const bids = [0, 1, 2, 3].map((i) => assignBid(design, site, start + i).bidMinor);
        expect([...bids].sort((a, b) => a - b)).toEqual([100, 200, 300, 400]);
      }
    }
  });

  it('keeps counts within one of each other after any number of respondents', () => {
    const counts = new Map<number, number>();
    for (let i = 0; i < 10; i++) {
      const bid = assignBid(design, 'shop-3', i).bidMinor;
      counts.set(bid, (counts.get(bid) ?? 0) + 1);
    }
    const values = [...counts.values()];
    expect(Math.max(...values) - Math.min(...values)).toBeLessThanOrEqual(1);
    expect(values.reduce((a, b) => a + b, 0)).toBe(10);
  });

  it('starts different sites at different bids, the same way every time', () => {
    const firsts = new Set(
      ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'].map((s) => assignBid(design, s, 0).bidMinor),
    );
    expect(firsts.size).toBeGreaterThan(1);
    expect(assignBid(design, 'market-east', 5)).toEqual(assignBid(design, 'market-east', 5));
  });

  it('returns the whole bid level, follow-ups included', () => {
    const double = { levels: [{ bidMinor: 200, afterYesMinor: 400, afterNoMinor: 100 }] };
    expect(assignBid(double, 'any', 7)).toEqual({
      bidMinor: 200,
      afterYesMinor: 400,
      afterNoMinor: 100,
    });
  });

  it('refuses an empty design and a negative or fractional index', () => {
    expect(() => assignBid({ levels: [] }, 'x', 0)).toThrow('The bid design has no bids to assign');
    expect(() => assignBid(design, 'x', -1)).toThrow('must be a whole number ≥ 0, not -1');
    expect(() => assignBid(design, 'x', 1.5)).toThrow('not 1.5');
  });
});

describe('stableSiteHash', () => {
  it('matches the published 32-bit FNV-1a test vectors', () => {
    // FNV-1a 32-bit values of "", "a" and "foobar" as listed in the FNV reference test vectors (from
    // memory; the same values come from an independent Python implementation of the algorithm)
    expect(stableSiteHash('')).toBe(0x811c9dc5);
    expect(stableSiteHash('a')).toBe(0xe40c292c);
    expect(stableSiteHash('foobar')).toBe(0xbf9cf968);
  });
});
