import { cellSupport, cellsBelowMinimum } from './cell-support';

describe('cellSupport', () => {
  const grid = [10, 20, 30];

  it('counts respondents with a price in each grid price’s cell, halfway to the neighbours', () => {
    // Cells: [5, 15), [15, 25), [25, 35]; each respondent counts once per cell (rule in the JSDoc).
    const evidence = [
      { points: [5] },
      { points: [14.9, 15] },
      { points: [24.99] },
      { points: [35] },
      { points: [36] },
    ];
    expect(cellSupport(grid, evidence)).toEqual([2, 2, 1]);
  });

  it('lets a cell without a design price borrow the nearest one, the smaller count on a tie', () => {
    const ladder = [10, 30];
    const evidence = [{ points: [10, 30] }, { points: [10, 30] }, { points: [10] }];
    // 20 lies halfway between 10 (3 asked) and 30 (2 asked): the smaller count, 2.
    expect(cellSupport(grid, evidence, ladder)).toEqual([3, 2, 2]);
  });

  it('counts a respondent whose range spans the price', () => {
    const evidence = [{ range: { low: 8, high: 22 } }, { range: { low: 20, high: 40 } }];
    expect(cellSupport(grid, evidence)).toEqual([1, 2, 1]);
  });

  it('names the rows under five respondents', () => {
    const rows = [
      { price: 1, respondents: 4 },
      { price: 2, respondents: 5 },
    ];
    expect(cellsBelowMinimum(rows)).toEqual([{ price: 1, respondents: 4 }]);
  });
});
