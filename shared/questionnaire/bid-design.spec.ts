import { type BidDesign, type BidBounds, checkBidDesign } from './bid-design';

function problemsOf(design: BidDesign, bounds: BidBounds): [string, string][] {
  const found: [string, string][] = [];
  checkBidDesign(design, bounds, { addIssue: (i) => found.push([i.path.join('.'), i.message]) });
  return found;
}

describe('checkBidDesign', () => {
  it('accepts double-bounded bids with a higher bid after yes and a lower one after no', () => {
    const design = { levels: [{ bidMinor: 200, afterYesMinor: 400, afterNoMinor: 100 }] };
    expect(problemsOf(design, 'double')).toEqual([]);
  });

  it('names follow-ups on the wrong side of their bid', () => {
    const design = { levels: [{ bidMinor: 200, afterYesMinor: 150, afterNoMinor: 250 }] };
    expect(problemsOf(design, 'double')).toEqual([
      ['bidDesign.levels.0.afterYesMinor', 'The follow-up after a yes must be higher than bid 1'],
      ['bidDesign.levels.0.afterNoMinor', 'The follow-up after a no must be lower than bid 1'],
    ]);
  });

  it('wants both follow-ups when double-bounded', () => {
    expect(problemsOf({ levels: [{ bidMinor: 200 }] }, 'double').map(([path]) => path)).toEqual([
      'bidDesign.levels.0.afterYesMinor',
      'bidDesign.levels.0.afterNoMinor',
    ]);
  });

  it('refuses follow-ups on a single-bounded design and a bid used twice', () => {
    const design = { levels: [{ bidMinor: 200 }, { bidMinor: 200, afterYesMinor: 300 }] };
    expect(problemsOf(design, 'single')).toEqual([
      ['bidDesign.levels.1.bidMinor', 'Bid 2 repeats bid 1'],
      ['bidDesign.levels.1.afterYesMinor', 'Only a double-bounded design has follow-up bids'],
    ]);
  });
});
