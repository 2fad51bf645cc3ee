import { weakInstrumentWarnings } from './weak-instrument';

describe('weakInstrumentWarnings', () => {
  it('warns when the first-stage F is below 10 (rule of thumb, common practice)', () => {
    const warnings = weakInstrumentWarnings({
      firstStages: [{ endogenous: 'price', fStatistic: 4.879 } as never],
    });
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatch(
      /^Weak instrument: the first-stage F for price is 4\.88, below about 10\./,
    );
  });

  it('says nothing for a strong first stage or a fit without instruments', () => {
    expect(
      weakInstrumentWarnings({ firstStages: [{ endogenous: 'price', fStatistic: 42 } as never] }),
    ).toEqual([]);
    expect(weakInstrumentWarnings({})).toEqual([]);
  });
});
