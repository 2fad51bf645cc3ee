import { householdBlocks } from '../demo/lantern/lantern-questionnaires';
import type { AnalysisInterview } from './analysis-interview';
import { respondentProfile } from './respondent-profile';

const interview = (answers: Record<string, unknown>): AnalysisInterview => ({
  id: 'a',
  finishedAt: '2026-11-02T10:00:00Z',
  routeId: null,
  pointId: null,
  region: 'Hill villages',
  answers,
  blocks: householdBlocks,
});

describe('respondentProfile', () => {
  it('takes a band’s midpoint as income, in major units', () => {
    const profile = respondentProfile(
      interview({ income: { band: '10k-25k' }, household: { people: 5 } }),
      2,
    );
    expect(profile).toEqual({
      income: 17500,
      householdSize: 5,
      levels: { 'income-band': '10k-25k', region: 'Hill villages', 'household-size': '5-6' },
    });
  });

  it('takes 1.5 × the lower bound of the open top band (the product’s stated rule)', () => {
    expect(respondentProfile(interview({ income: { band: 'over-50k' } }), 2).income).toBe(75000);
  });

  it('puts unanswered characteristics in the not-stated level', () => {
    const profile = respondentProfile(interview({ income: { band: null } }), 2);
    expect(profile.income).toBeNull();
    expect(profile.levels['income-band']).toBe('not-stated');
    expect(profile.levels['household-size']).toBe('not-stated');
  });
});
