import { jest } from '@jest/globals';
import { eq, inArray, sql } from 'drizzle-orm';
import type { FitResource } from '@shared/analysis/fit-resource';
import type { FitSpec, FitSpecOf } from '@shared/analysis/fit-spec';
import { loadFitInput } from '../../server/analysis/load-fit-input';
import { respondentWeights } from '../../server/analysis/respondent-weights';
import { estimateFit, prepareFit, runFit } from '../../server/analysis/run-fit';
import {
  isStated,
  prepareTabulatedFit,
} from '../../server/analysis/tabulated/prepare-tabulated-fit';
import { tabulateDataset } from '../../server/analysis/tabulated/tabulate-dataset';
import { fits } from '../../server/db/schema';
import { jobSchema } from '../../server/fits/fit-queue';
import { fitSender, stopFitSenders } from '../../server/fits/fit-sender';
import { runFitJob } from '../../server/fits/run-fit-job';
import { startWorkerProcess, type WorkerProcess } from '../../tools/stack/worker-process';
import { insertLanternData } from '../support/analysis-study';
import { insertAwkwardData } from '../support/awkward-study';
import type { FitResult } from '@shared/analysis/fit-result';
import { commonSpec, manySpecs, shelfLogLog } from '../support/fit-specs';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';

const { app, deps } = createTestApp();
const workers: WorkerProcess[] = [];
let researcher: SignedInAgent;
let studyId: string;
let awkwardStudyId: string;

jest.setTimeout(240_000);

beforeAll(async () => {
  const organisation = await createTestOrganisation(deps.db, 'Fit jobs');
  const members = [{ person: organisation.people.researcher, roles: ['researcher' as const] }];
  studyId = await insertStudy(deps.db, organisation.id, members, 'Lantern fits');
  awkwardStudyId = await insertStudy(deps.db, organisation.id, members, 'Awkward fits');
  await insertLanternData(deps.db, studyId);
  await insertAwkwardData(deps.db, awkwardStudyId);
  researcher = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
    userId: organisation.people.researcher.userId,
    organisationId: organisation.id,
  });
  // Two worker processes against the one queue, as two machines would run them.
  workers.push(
    ...(await Promise.all([startWorkerProcess({}, true), startWorkerProcess({}, true)])),
  );
});

afterAll(async () => {
  await Promise.all(workers.map((w) => w.stop()));
  await stopFitSenders();
  await deps.db.$client.end();
});

async function requestFit(study: string, spec: FitSpec): Promise<string> {
  const response = await researcher.post(`/api/studies/${study}/fits`, { spec });
  expect(response.status).toBe(202);
  return response.body.fitId as string;
}

/** Polls until every fit is done or failed. */
async function settled(ids: string[]): Promise<(typeof fits.$inferSelect)[]> {
  for (let i = 0; i < 600; i++) {
    const rows = await deps.db.select().from(fits).where(inArray(fits.id, ids));
    if (rows.every((r) => r.status === 'done' || r.status === 'failed')) return rows;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('fits did not finish within 120 s');
}

const plain = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

describe('fit jobs on the queue', () => {
  let ids: string[];
  let rows: (typeof fits.$inferSelect)[];

  beforeAll(async () => {
    ids = [];
    for (const spec of [...manySpecs, ...manySpecs]) ids.push(await requestFit(studyId, spec));
    rows = await settled(ids);
  });

  it('runs every job exactly once, spread over more than one worker', async () => {
    expect(rows.map((r) => [r.status, r.attempts])).toEqual(ids.map(() => ['done', 1]));
    expect(new Set(rows.map((r) => r.workerId)).size).toBeGreaterThanOrEqual(2);
    const jobs = await deps.db.execute<{ id: string; state: string; retry_count: number }>(
      sql.raw(
        `select id::text, state, retry_count from ${jobSchema}.job where id in (${ids.map((id) => `'${id}'`).join(',')})`,
      ),
    );
    expect(jobs.rows).toHaveLength(ids.length);
    expect(jobs.rows.every((j) => j.state === 'completed' && j.retry_count === 0)).toBe(true);
  });

  it('stores exactly what the engine gives in-process on the same data', async () => {
    for (const row of rows) {
      const spec = row.spec as FitSpec;
      const input = await loadFitInput(deps.db, studyId, spec.filters);
      if (!isStated(spec)) {
        const expected = runFit(input, spec);
        expect(row.result).toEqual(plain(expected));
        expect(row.dataHash).toBe(expected.dataHash);
        continue;
      }
      // Stated methods run on the frequency table: the same table built in memory gives the
      // same result; the hash is the database's, over the typed rows it counted.
      const prepared = prepareFit(input, spec);
      const table = tabulateDataset(prepared.dataset as never, spec);
      const weights = respondentWeights(table, spec.weighting);
      const { dataHash } = await prepareTabulatedFit(deps.db, studyId, spec);
      const expected = estimateFit({ ...prepared, dataset: table, weights, dataHash }, spec);
      expect(row.result).toEqual(plain(expected));
      expect(row.dataHash).toBe(dataHash);
    }
  });

  it('gives the same spec on the same data the same numbers and data hash', () => {
    const half = manySpecs.length;
    rows.sort((a, b) => ids.indexOf(a.id) - ids.indexOf(b.id));
    for (let k = 0; k < half; k++) {
      expect(rows[k + half].result).toEqual(rows[k].result);
    }
    // Different filters use different rows, so their hashes differ (dichotomous: flagged in/out).
    expect(rows[half - 1].dataHash).not.toBe(rows[half - 2].dataHash);
  });

  it('gives every price among the key figures an interval that holds its estimate', () => {
    // Ladder grid maxima and threshold crossings by respondent resampling, curve optima by
    // parameter draws, the rest by the delta method: no price goes out as if it were known.
    const prices = rows.flatMap((row) =>
      (row.result as FitResult).keyFigures.filter((k) => k.unit === 'price'),
    );
    expect(prices.length).toBeGreaterThan(10);
    const unbracketed = prices.filter(
      (price) =>
        typeof price.ciLow !== 'number' ||
        typeof price.ciHigh !== 'number' ||
        !(price.ciLow <= price.estimate && price.estimate <= price.ciHigh),
    );
    expect(unbracketed).toEqual([]);
  });

  it('gives every row of every schedule a band that holds its estimate', () => {
    // Regression and likelihood curves by the delta method, the tabulated curves (threshold
    // trial curve, open-WTP curve) by respondent resampling: no share goes out bare.
    const bare = rows.flatMap((row) =>
      ((row.result as FitResult).schedule?.rows ?? [])
        .filter(
          (r) =>
            r.ciLow === null ||
            r.ciHigh === null ||
            !(r.ciLow <= r.quantity && r.quantity <= r.ciHigh),
        )
        .map((r) => `${(row.spec as FitSpec).method} at ${r.price}`),
    );
    expect(rows.filter((row) => (row.result as FitResult).schedule).length).toBeGreaterThan(5);
    expect(bare).toEqual([]);
  });

  it('stores one result when a job is delivered again', async () => {
    const [first] = rows;
    await runFitJob(deps.db, first.id, 'test-redelivery');
    expect(await fitSender(deps.config.DATABASE_URL).send(first.id)).toBe(false);
    await new Promise((r) => setTimeout(r, 1500));
    const [again] = await deps.db.select().from(fits).where(eq(fits.id, first.id));
    expect(again.attempts).toBe(1);
    expect(again.workerId).toBe(first.workerId);
    expect(again.result).toEqual(first.result);
  });

  it('shows progress and the result through the API', async () => {
    const response = await researcher.get(`/api/studies/${studyId}/fits/${ids[0]}`);
    // Results travel compressed (the agent, like a browser, accepts gzip).
    expect(response.headers['content-encoding']).toBe('gzip');
    const fit = response.body as FitResource;
    expect(fit).toMatchObject({ status: 'done', progress: 100, dataHash: rows[0].dataHash });
    expect(fit.result?.schedule?.rows).toHaveLength(commonSpec.priceGrid.steps);
    const list = await researcher.get(`/api/studies/${studyId}/fits`);
    expect(list.body).toHaveLength(ids.length);
  });
});

describe('fits the data refuses', () => {
  const awkward = (spec: FitSpec) => requestFit(awkwardStudyId, spec);
  const recall: FitSpecOf<'observed-prices'> = {
    ...shelfLogLog,
    source: 'recall',
    form: 'linear',
    regionEffects: false,
    standardErrors: 'classical',
  };

  it.each([
    ['a non-positive quantity under a log', shelfLogLog, 'non-positive-log', 'quantity'],
    [
      'a filter that leaves no interview',
      { ...recall, filters: { flagged: 'include', from: '2030-01-01' } },
      'too-few-observations',
      'filters',
    ],
    [
      'a singular design',
      { ...recall, covariates: ['income'], filters: { flagged: 'include', regions: ['East'] } },
      'singular-design',
      undefined,
    ],
    [
      'margins raking cannot meet',
      {
        ...recall,
        weighting: {
          margins: [
            { variable: 'region', targets: { East: 0.5, West: 0.5 } },
            { variable: 'income-band', targets: { 'under-10k': 0.8, 'over-50k': 0.2 } },
          ],
        },
      },
      'not-converged',
      'targets',
    ],
  ] as [string, FitSpec, string, string | undefined][])(
    'fails a fit with %s, saying so',
    async (_label, spec, code, field) => {
      const id = await awkward(spec);
      const [row] = await settled([id]);
      expect(row.status).toBe('failed');
      expect(row.result).toBeNull();
      expect(row.error).toMatchObject({ code, ...(field ? { field } : {}) });
      expect((row.error as { message: string }).message.length).toBeGreaterThan(20);
    },
  );

  it('allows prices outside the observed range but flags them as extrapolation', async () => {
    const id = await requestFit(studyId, {
      method: 'price-ladder',
      ...commonSpec,
      priceGrid: { from: 400, to: 4000, steps: 10 },
    });
    const [row] = await settled([id]);
    const result = row.result as NonNullable<FitResource['result']>;
    const flagged = result.schedule!.rows.filter((r) => r.extrapolated).map((r) => r.price);
    const grid = Array.from({ length: 10 }, (_, k) => 400 + 400 * k);
    // The ladder asked 800 to 2600 KES (the demo questionnaire), so the rest is extrapolation.
    expect(flagged).toEqual(grid.filter((p) => p < 800 || p > 2600));
    // Prices are named in the study's currency (a no-break space keeps code and amount together).
    const kes = (amount: string) => `KES\u00a0${amount}`;
    expect(result.warnings).toContain(
      `5 grid prices lie outside the observed prices ${kes('800')}–${kes('2,600')} and are ` +
        `extrapolation: ${['400', '2,800', '3,200', '3,600', '4,000'].map(kes).join(', ')}`,
    );
  });
});
