import { jest } from '@jest/globals';
import { sql } from 'drizzle-orm';
import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { loadFitInput } from '../../server/analysis/load-fit-input';
import { runFit } from '../../server/analysis/run-fit';
import { fitShelfInDatabase } from '../../server/analysis/shelf-fit-in-database';
import { insertLanternData } from '../support/analysis-study';
import { relativeGap } from '../support/dataset-oracle';
import { shelfLogLog } from '../support/fit-specs';
import { insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';

const { deps } = createTestApp();
let studyId: string;

jest.setTimeout(120_000);

beforeAll(async () => {
  const organisation = await createTestOrganisation(deps.db, 'Shelf rows');
  studyId = await insertStudy(deps.db, organisation.id, [], 'Shelf rows in the database');
  await insertLanternData(deps.db, studyId);
  // The same statement the migration ran for interviews stored before it, and sync runs after.
  await deps.db.execute(
    sql`SELECT refresh_shelf_observation_rows(ARRAY(SELECT id FROM interviews WHERE study_id = ${studyId}))`,
  );
});

afterAll(async () => {
  await deps.db.$client.end();
});

const specs: Record<string, FitSpecOf<'observed-prices'>> = {
  'log-log, region effects, HC1': shelfLogLog,
  'linear, classical, no effects': {
    ...shelfLogLog,
    form: 'linear',
    regionEffects: false,
    standardErrors: 'classical',
  },
  'semi-log, region effects, clustered by point': {
    ...shelfLogLog,
    form: 'semilog',
    standardErrors: 'cluster-point',
  },
  'log-log, flagged interviews left out': {
    ...shelfLogLog,
    filters: { ...shelfLogLog.filters, flagged: 'exclude' },
  },
};

describe('observed-price fits on typed shelf rows, in the database', () => {
  it('writes one typed row per answered shelf observation', async () => {
    const rows = await deps.db.execute(
      sql`SELECT count(*) AS n FROM shelf_observation_rows WHERE study_id = ${studyId}`,
    );
    // Counted independently from the interviews' JSON answers and their blocks.
    const { interviews } = await loadFitInput(deps.db, studyId, { flagged: 'include' });
    const answered = interviews.flatMap((i) =>
      i.blocks.filter((b) => b.kind === 'shelf-observation' && i.answers[b.id] != null),
    );
    expect(answered.length).toBeGreaterThan(0);
    expect(Number(rows.rows[0]['n'])).toBe(answered.length);
  });

  it.each(Object.entries(specs))('%s equals the in-memory fit to 1e-9', async (_, spec) => {
    const oracle = runFit(await loadFitInput(deps.db, studyId, spec.filters), spec);
    const { fit } = await fitShelfInDatabase(deps.db, studyId, 'KES', spec);
    expect(fit.n).toBe(oracle.observations);
    expect(fit.coefficients).toHaveLength(oracle.coefficients.length);
    fit.coefficients.forEach((row, j) => {
      const expected = oracle.coefficients[j];
      expect(relativeGap(row.estimate, expected.estimate)).toBeLessThan(1e-9);
      expect(relativeGap(row.stdError, expected.stdError ?? NaN)).toBeLessThan(1e-9);
    });
    const own = fit.elasticities.find((e) => e.kind === 'own-price')!;
    const ownOracle = oracle.elasticities.find((e) => e.kind === 'own-price')!;
    expect(relativeGap(own.estimate, ownOracle.estimate)).toBeLessThan(1e-9);
    expect(relativeGap(own.stdError, ownOracle.stdError)).toBeLessThan(1e-9);
  });

  it('refuses what only the in-memory path reads, naming the field', async () => {
    await expect(
      fitShelfInDatabase(deps.db, studyId, 'KES', { ...shelfLogLog, instrument: 'peer-price' }),
    ).rejects.toMatchObject({ code: 'invalid-option', field: 'instrument' });
  });
});
