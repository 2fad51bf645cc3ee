import type { FitSpec } from '@shared/analysis/fit-spec';
import { householdBlocks } from '../demo/lantern/lantern-questionnaires';
import type { AnalysisInterview } from './analysis-interview';
import { buildDataset } from './build-dataset';
import { dataHash } from './data-hash';
import { datasetTable } from './dataset-table';

const household = (id: string, amountMinor: number, band: string): AnalysisInterview => ({
  id,
  finishedAt: '2026-11-02T10:00:00Z',
  routeId: null,
  pointId: null,
  region: 'North shore',
  answers: { consent: { agreed: true }, income: { band }, most_pay: { amountMinor } },
  blocks: householdBlocks,
});
const spec: FitSpec = {
  method: 'wtp-open',
  filters: { flagged: 'include' },
  weighting: null,
  priceGrid: { from: 1, to: 2, steps: 2 },
  unitCost: null,
  confidenceLevel: 0.95,
  bootstrap: { replicates: 100, seed: 1 },
};
const hashOf = (interviews: AnalysisInterview[], s: FitSpec = spec) => {
  const dataset = buildDataset(interviews, s, 2);
  return dataHash(s.method, datasetTable(dataset, s));
};
const a = household('a', 150000, '10k-25k');
const b = household('b', 120000, 'over-50k');

describe('the data hash', () => {
  it('is a SHA-256 in hex that does not depend on the order interviews arrive in', () => {
    expect(hashOf([a, b])).toMatch(/^[0-9a-f]{64}$/);
    expect(hashOf([b, a])).toBe(hashOf([a, b]));
  });

  it('changes when a value used changes, and not when an unused one does', () => {
    expect(hashOf([a, household('b', 120050, 'over-50k')])).not.toBe(hashOf([a, b]));
    expect(hashOf([a, household('b', 120000, 'under-10k')])).toBe(hashOf([a, b]));
  });

  it('covers the raking variables once the fit is weighted', () => {
    const weighted: FitSpec = {
      ...spec,
      weighting: {
        margins: [
          { variable: 'income-band', targets: { '10k-25k': 1, 'over-50k': 1, 'under-10k': 1 } },
        ],
      },
    };
    expect(hashOf([a, household('b', 120000, 'under-10k')], weighted)).not.toBe(
      hashOf([a, b], weighted),
    );
  });
});
