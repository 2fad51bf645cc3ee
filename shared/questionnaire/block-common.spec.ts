import { requireIncreasing } from './block-common';

function issuesFor(values: number[]) {
  const issues: { message: string; path: (string | number)[] }[] = [];
  requireIncreasing(values, 'pricesMinor', 'Price', { addIssue: (issue) => issues.push(issue) });
  return issues;
}

describe('requireIncreasing', () => {
  it('accepts amounts that rise at every step', () => {
    expect(issuesFor([50000, 100000, 150000])).toEqual([]);
  });

  it('names each position that does not rise, without the stored minor units', () => {
    expect(issuesFor([150000, 100000, 100000])).toEqual([
      {
        code: 'custom',
        path: ['pricesMinor', 1],
        message: 'Each price must be higher than the one before: price 2 is not',
      },
      {
        code: 'custom',
        path: ['pricesMinor', 2],
        message: 'Each price must be higher than the one before: price 3 is not',
      },
    ]);
  });

  it('never shows a number the researcher did not type', () => {
    const [issue] = issuesFor([150000, 100000]);
    expect(issue.message).not.toMatch(/150000|100000/);
  });
});
