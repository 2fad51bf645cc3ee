import type { EstimatedFigure } from '@shared/analysis/estimated-figure';
import { policyFigureLines } from './policy-figure-lines';
import { policyFigureOrder, type PolicyKind } from './policy-simulation';

const figure = (estimate: number): EstimatedFigure => ({
  estimate,
  low: estimate - 1,
  high: estimate + 1,
  note: null,
});
const figures = Object.fromEntries(policyFigureOrder.map((key) => [key, figure(0.5)])) as Record<
  (typeof policyFigureOrder)[number],
  EstimatedFigure
>;

const sharesOf = (kind: PolicyKind) =>
  policyFigureLines(figures, kind, 'share')
    .filter((line) => line.key === 'buyerShare' || line.key === 'sellerShare')
    .map((line) => line.label);

describe('policy figure lines', () => {
  it('says who bears a tax', () => {
    expect(sharesOf('unit-tax')).toEqual(['Borne by buyers', 'Borne by sellers']);
  });

  it('says what each side gains from a subsidy instead of what it bears', () => {
    expect(sharesOf('unit-subsidy')).toEqual([
      'Buyers’ share of the subsidy’s benefit',
      'Sellers’ share of the subsidy’s benefit',
    ]);
  });

  it('speaks of a co-payment’s benefit too, never of a burden', () => {
    const labels = sharesOf('co-payment');
    expect(labels).toEqual([
      'Buyers’ share of the co-payment’s benefit',
      'Sellers’ share of the co-payment’s benefit',
    ]);
    for (const label of labels) expect(label).not.toMatch(/borne/i);
  });
});
