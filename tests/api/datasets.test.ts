import { createHash } from 'node:crypto';
import { jest } from '@jest/globals';
import { eq, sql } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import type { DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import type { DatasetResource } from '@shared/datasets/dataset-resource';
import {
  datasetFits,
  datasets,
  datasetUploadChunks,
  fits,
  scheduleVersions,
} from '../../server/db/schema';
import { stopDatasetSenders } from '../../server/datasets/dataset-queue';
import { runDatasetFit } from '../../server/datasets/run-dataset-fit';
import { startWorkerProcess, type WorkerProcess } from '../../tools/stack/worker-process';
import { importedDataset, sendChunk, settledFit, uploadFile } from '../support/dataset-client';
import { fitFigures, inMemoryDatasetFit, relativeGap } from '../support/dataset-oracle';
import { csvText, salesHeader, salesMapping, salesRows } from '../support/sales-csv';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';
import { loadStrdSet } from '../fixtures/strd/load-strd-set';

const testApp = createTestApp();
const { app, deps } = testApp;
let researcher: SignedInAgent;
let client: SignedInAgent;
let studyId: string;
let worker: WorkerProcess;
let sales: DatasetResource;

jest.setTimeout(300_000);

const salesCsv = Buffer.from(csvText(salesHeader, salesRows(1200)));

beforeAll(async () => {
  const organisation = await createTestOrganisation(deps.db, 'Datasets');
  studyId = await insertStudy(deps.db, organisation.id, [
    { person: organisation.people.researcher, roles: ['researcher'] },
    { person: organisation.people.client, roles: ['client'] },
  ]);
  const who = (role: 'researcher' | 'client') => ({
    userId: organisation.people[role].userId,
    organisationId: organisation.id,
  });
  researcher = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, who('researcher'));
  client = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, who('client'));
  worker = await startWorkerProcess({}, true);
});

afterAll(async () => {
  await worker.stop();
  await stopDatasetSenders();
  await deps.db.$client.end();
});

async function importFile(
  fileName: string,
  bytes: Buffer,
  columns: readonly object[] = salesMapping,
  name = fileName,
): Promise<DatasetResource> {
  const uploadId = await uploadFile(researcher, studyId, fileName, bytes, 16 * 1024);
  const accepted = await researcher.post(`/api/studies/${studyId}/datasets`, {
    uploadId,
    name,
    columns,
  });
  expect(accepted.status).toBe(202);
  return importedDataset(researcher, studyId, accepted.body.datasetId as string);
}

const tableExists = async (datasetId: string) =>
  (
    await deps.db.execute(
      sql`SELECT to_regclass(${`study_data.dataset_${datasetId.replaceAll('-', '')}`}) AS t`,
    )
  ).rows[0]['t'] !== null;

describe('bringing a dataset in', () => {
  it('takes a CSV in chunks, resumes at the server count, and imports every row', async () => {
    const started = await researcher.post(`/api/studies/${studyId}/dataset-uploads`, {
      fileName: 'sales.csv',
      totalBytes: salesCsv.length,
    });
    expect(started.status).toBe(201);
    const uploadId = started.body.uploadId as string;
    const first = await sendChunk(researcher, studyId, uploadId, 0, salesCsv.subarray(0, 20_000));
    expect(first.body.receivedBytes).toBe(20_000);
    // The connection dropped and the client lost track: a chunk at the wrong offset is refused…
    const wrong = await sendChunk(
      researcher,
      studyId,
      uploadId,
      30_000,
      salesCsv.subarray(30_000, 40_000),
    );
    expect(wrong.status).toBe(409);
    expect(wrong.body.error.message).toContain('20000');
    // …and the server's own count says where to resume.
    const state = await researcher.get(`/api/studies/${studyId}/dataset-uploads/${uploadId}`);
    expect(state.body).toMatchObject({ receivedBytes: 20_000, complete: false });
    for (let offset = 20_000; offset < salesCsv.length; offset += 20_000) {
      const sent = await sendChunk(
        researcher,
        studyId,
        uploadId,
        offset,
        salesCsv.subarray(offset, offset + 20_000),
      );
      expect(sent.status).toBe(200);
    }
    const preview = await researcher.get(
      `/api/studies/${studyId}/dataset-uploads/${uploadId}/preview`,
    );
    expect(preview.body.headers).toEqual(salesHeader);
    expect(preview.body.rows).toHaveLength(20);
    expect(preview.body.suggested.find((s: { source: string }) => s.source === 'Price').role).toBe(
      'price',
    );

    const accepted = await researcher.post(`/api/studies/${studyId}/datasets`, {
      uploadId,
      name: 'Outlet sales',
      columns: salesMapping,
    });
    expect(accepted.status).toBe(202);
    sales = await importedDataset(researcher, studyId, accepted.body.datasetId as string);
    expect(sales).toMatchObject({ status: 'imported', rowCount: 1200, problems: [] });
    // The hash is the file's SHA-256 (node:crypto over the same bytes).
    expect(sales.contentHash).toBe(createHash('sha256').update(salesCsv).digest('hex'));
    const chunks = await deps.db
      .select()
      .from(datasetUploadChunks)
      .where(eq(datasetUploadChunks.uploadId, uploadId));
    expect(chunks).toHaveLength(0);
    const stored = await deps.db.execute(
      sql`SELECT count(*) AS n, sum(units) AS units, min(line) AS first, max(line) AS last
          FROM ${sql.identifier('study_data')}.${sql.identifier(`dataset_${sales.id.replaceAll('-', '')}`)}`,
    );
    const expectedUnits = salesRows(1200).reduce((s, r) => s + Number(r[3]), 0);
    expect(stored.rows[0]).toMatchObject({ n: 1200, units: expectedUnits, first: 2, last: 1201 });
    const listed = await researcher.get(`/api/studies/${studyId}/datasets`);
    expect(listed.body.map((d: DatasetResource) => d.id)).toContain(sales.id);
  });

  it('recognises the same file again and stores it once', async () => {
    const uploadId = await uploadFile(researcher, studyId, 'sales-again.csv', salesCsv);
    const again = await researcher.post(`/api/studies/${studyId}/datasets`, {
      uploadId,
      name: 'Same sales',
      columns: salesMapping,
    });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('duplicate-dataset');
    expect(again.body.error.message).toContain('Outlet sales');
    const rows = await deps.db.select().from(datasets).where(eq(datasets.studyId, studyId));
    expect(rows.filter((r) => r.contentHash === sales.contentHash)).toHaveLength(1);
  });

  it('reads an XLSX workbook to the same rows', async () => {
    const book = new ExcelJS.Workbook();
    const sheet = book.addWorksheet('Sales');
    sheet.addRow(salesHeader);
    for (const row of salesRows(300, 11))
      sheet.addRow(row.map((v, i) => (i >= 2 && i <= 7 ? Number(v) : v)));
    const bytes = Buffer.from(await book.xlsx.writeBuffer());
    const dataset = await importFile('sales.xlsx', bytes);
    expect(dataset).toMatchObject({ status: 'imported', rowCount: 300 });
    const sums = await deps.db.execute(
      sql`SELECT sum(price) AS price FROM study_data.${sql.identifier(`dataset_${dataset.id.replaceAll('-', '')}`)}`,
    );
    const expected = salesRows(300, 11).reduce((s, r) => s + Number(r[2]), 0);
    expect(relativeGap(Number(sums.rows[0]['price']), expected)).toBeLessThan(1e-12);
  });

  it('refuses a file with bad values, naming line and column, and stores nothing', async () => {
    const rows = salesRows(50, 3);
    rows[4][2] = 'abc';
    rows[9][3] = '-4';
    rows[14][0] = '2025-02-30';
    const bad = Buffer.from(csvText(salesHeader, rows));
    const dataset = await importFile('bad-sales.csv', bad);
    expect(dataset.status).toBe('failed');
    expect(dataset.problems).toEqual([
      { line: 6, column: 'Price', message: expect.stringContaining('"abc" is not a number') },
      { line: 11, column: 'Units sold', message: expect.stringContaining('cannot be negative') },
      { line: 16, column: 'Week start', message: expect.stringContaining('not a date') },
    ]);
    expect(dataset.rowCount).toBe(0);
    expect(await tableExists(dataset.id)).toBe(false);
    // Fixed, the same study takes it.
    rows[4][2] = '25.5';
    rows[9][3] = '4';
    rows[14][0] = '2025-02-28';
    const fixed = await importFile('fixed-sales.csv', Buffer.from(csvText(salesHeader, rows)));
    expect(fixed).toMatchObject({ status: 'imported', rowCount: 50 });
  });

  it('names a mapped column the file lacks, a header without rows, and an empty file', async () => {
    const noIncome = Buffer.from(
      csvText(
        salesHeader.filter((h) => h !== 'Income'),
        salesRows(5).map((r) => r.filter((_, i) => i !== 5)),
      ),
    );
    const missing = await importFile('no-income.csv', noIncome);
    expect(missing.problems[0]).toMatchObject({ line: 1, column: 'Income' });
    expect(missing.problems[0].message).toContain('has no column "Income"');

    const headerOnly = await importFile('header.csv', Buffer.from(`${salesHeader.join(',')}\n`));
    expect(headerOnly.status).toBe('failed');
    expect(headerOnly.problems[0].message).toContain('header row but no data rows');

    const empty = await researcher.post(`/api/studies/${studyId}/dataset-uploads`, {
      fileName: 'empty.csv',
      totalBytes: 0,
    });
    expect(empty.status).toBe(400);
    expect(empty.body.error.issues[0]).toMatchObject({
      path: 'totalBytes',
      message: 'The file is empty',
    });
  });

  it('refuses what is not CSV or XLSX, and a column mapped twice', async () => {
    const pdf = await researcher.post(`/api/studies/${studyId}/dataset-uploads`, {
      fileName: 'sales.pdf',
      totalBytes: 100,
    });
    expect(pdf.status).toBe(400);
    expect(pdf.body.error.issues[0].path).toBe('fileName');
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const started = await researcher.post(`/api/studies/${studyId}/dataset-uploads`, {
      fileName: 'photo.csv',
      totalBytes: png.length,
    });
    const sent = await sendChunk(researcher, studyId, started.body.uploadId as string, 0, png);
    expect(sent.status).toBe(400);
    expect(sent.body.error.message).toContain('not a CSV text file');
    const fakeBook = await researcher.post(`/api/studies/${studyId}/dataset-uploads`, {
      fileName: 'sales.xlsx',
      totalBytes: 10,
    });
    const notZip = await sendChunk(
      researcher,
      studyId,
      fakeBook.body.uploadId as string,
      0,
      Buffer.from('a,b\n1,2\n..'),
    );
    expect(notZip.status).toBe(400);
    expect(notZip.body.error.message).toContain('not an Excel workbook');

    const uploadId = await uploadFile(
      researcher,
      studyId,
      'twice.csv',
      Buffer.from(csvText(salesHeader, salesRows(5, 5))),
    );
    const twice = await researcher.post(`/api/studies/${studyId}/datasets`, {
      uploadId,
      name: 'Twice',
      columns: [
        ...salesMapping,
        { source: 'Price', name: 'price_again', role: 'covariate', type: 'number' },
      ],
    });
    expect(twice.status).toBe(400);
    expect(twice.body.error.issues).toContainEqual({
      path: 'columns.9.source',
      message: expect.stringContaining('"Price" is mapped twice'),
    });
  });

  it('keeps clients out', async () => {
    expect((await client.get(`/api/studies/${studyId}/datasets`)).status).toBe(403);
  });
});

/** Every fit kind, each compared with the in-memory path on the same rows. */
const fitSpecs: Record<string, DatasetFitSpec> = {
  'log-log, outlet effects, cross price, clustered by outlet': {
    form: 'loglog',
    covariates: [{ column: 'rival_price', role: 'cross-price' }],
    fixedEffects: ['outlet'],
    weighted: false,
    standardErrors: { type: 'cluster', column: 'outlet' },
    instruments: [],
    confidenceLevel: 0.95,
  },
  'linear, income, HC1': {
    form: 'linear',
    covariates: [{ column: 'income', role: 'income' }],
    fixedEffects: [],
    weighted: false,
    standardErrors: { type: 'hc1' },
    instruments: [],
    confidenceLevel: 0.9,
  },
  'semi-log, weighted, shore effects, classical': {
    form: 'semilog',
    covariates: [
      { column: 'income', role: 'income' },
      { column: 'rival_price', role: 'cross-price' },
    ],
    fixedEffects: ['shore'],
    weighted: true,
    standardErrors: { type: 'classical' },
    instruments: [],
    confidenceLevel: 0.95,
  },
  'log-log 2SLS on unit cost, HC1': {
    form: 'loglog',
    covariates: [{ column: 'income', role: 'income' }],
    fixedEffects: [],
    weighted: false,
    standardErrors: { type: 'hc1' },
    instruments: ['unit_cost'],
    confidenceLevel: 0.95,
  },
  'linear 2SLS, weighted, outlet effects, clustered by outlet': {
    form: 'linear',
    covariates: [{ column: 'rival_price', role: 'cross-price' }],
    fixedEffects: ['outlet'],
    weighted: true,
    standardErrors: { type: 'cluster', column: 'outlet' },
    instruments: ['unit_cost'],
    confidenceLevel: 0.95,
  },
  'semi-log 2SLS, classical': {
    form: 'semilog',
    covariates: [],
    fixedEffects: [],
    weighted: false,
    standardErrors: { type: 'classical' },
    instruments: ['unit_cost'],
    confidenceLevel: 0.95,
  },
};

async function fitDataset(datasetId: string, spec: DatasetFitSpec) {
  const asked = await researcher.post(`/api/studies/${studyId}/datasets/${datasetId}/fits`, {
    spec,
  });
  expect(asked.status).toBe(202);
  return settledFit(researcher, studyId, asked.body.fitId as string);
}

describe('fits on a dataset, in the database', () => {
  it.each(Object.entries(fitSpecs))('%s equals the in-memory fit to 1e-9', async (_, spec) => {
    const fit = await fitDataset(sales.id, spec);
    expect(fit.error).toBeNull();
    expect(fit.status).toBe('done');
    const result = fit.result!;
    expect(result.engine).toBe('in-database');
    expect(result.fixedEffectMethod).toBe('dummies');
    const oracle = await inMemoryDatasetFit(
      deps.db,
      sales.id,
      { quantity: 'units', price: 'price', weight: 'weight' },
      spec,
    );
    const expected = fitFigures(oracle);
    const got = fitFigures(result.fit);
    expect([...got.keys()].sort()).toEqual([...expected.keys()].sort());
    for (const [name, value] of expected) {
      expect({ name, gap: relativeGap(got.get(name)!, value) < 1e-9 }).toEqual({ name, gap: true });
    }
    expect(result.fit.elasticities.find((e) => e.kind === 'own-price')).toBeDefined();
    expect(result.fit.fixedEffectBases).toEqual(oracle.fixedEffectBases);
  });

  it('names the cross-price elasticity and gives the same data hash for the same rows', async () => {
    const spec = fitSpecs['log-log, outlet effects, cross price, clustered by outlet'];
    const [a, b] = [await fitDataset(sales.id, spec), await fitDataset(sales.id, spec)];
    const cross = a.result!.fit.elasticities.find((e) => e.kind === 'cross-price')!;
    expect(cross.term).toBe('rival_price');
    expect(cross.ciLow).toBeLessThan(cross.estimate);
    expect(a.dataHash).toBe(b.dataHash);
    expect(a.result!.fit.standardErrors).toMatchObject({
      type: 'cluster',
      clusterColumn: 'outlet',
      clusters: 6,
    });
  });

  it('matches the certified NIST StRD Longley solution when Longley is imported', async () => {
    const longley = loadStrdSet('Longley');
    const header = ['y', 'x1', 'x2', 'x3', 'x4', 'x5', 'x6'];
    const rows = longley.y.map((y, i) => [y, ...longley.X![i]].map(String));
    const dataset = await importFile('longley.csv', Buffer.from(csvText(header, rows)), [
      { source: 'y', name: 'y', role: 'quantity', type: 'number' },
      { source: 'x1', name: 'x1', role: 'price', type: 'number' },
      ...['x2', 'x3', 'x4', 'x5', 'x6'].map((x) => ({
        source: x,
        name: x,
        role: 'covariate',
        type: 'number',
      })),
    ]);
    expect(dataset.status).toBe('imported');
    const fit = await fitDataset(dataset.id, {
      form: 'linear',
      covariates: ['x2', 'x3', 'x4', 'x5', 'x6'].map((column) => ({
        column,
        role: 'other' as const,
      })),
      fixedEffects: [],
      weighted: false,
      standardErrors: { type: 'classical' },
      instruments: [],
      confidenceLevel: 0.95,
    });
    const terms = ['(intercept)', 'x1', 'x2', 'x3', 'x4', 'x5', 'x6'];
    const byTerm = new Map(fit.result!.fit.coefficients.map((c) => [c.term, c]));
    // Certified values: NIST StRD Longley (tests/fixtures/strd/Longley.json), 15 digits.
    terms.forEach((term, j) => {
      expect(
        relativeGap(byTerm.get(term)!.estimate, longley.certified.coefficients[j]),
      ).toBeLessThan(1e-9);
      expect(
        relativeGap(byTerm.get(term)!.stdError, longley.certified.standardErrors[j]),
      ).toBeLessThan(1e-9);
    });
    expect(relativeGap(fit.result!.fit.rSquared, longley.certified.rSquared)).toBeLessThan(1e-9);
  });
});

describe('fits refused with the reason', () => {
  it('names the line of a zero quantity under a log form', async () => {
    const rows = salesRows(40, 9);
    rows[6][3] = '0';
    const dataset = await importFile('zero.csv', Buffer.from(csvText(salesHeader, rows)));
    const fit = await fitDataset(dataset.id, fitSpecs['log-log 2SLS on unit cost, HC1']);
    expect(fit.status).toBe('failed');
    expect(fit.error).toMatchObject({ code: 'non-positive-log', field: 'units' });
    expect(fit.error!.message).toContain('line 8');
    expect(fit.result).toBeNull();
  });

  it('refuses a fixed-effect grouping with one level and an instrument that is the price', async () => {
    const oneShore = salesRows(40, 13).map((r) => [...r.slice(0, 8), 'North shore']);
    const dataset = await importFile('one-shore.csv', Buffer.from(csvText(salesHeader, oneShore)));
    const single = await fitDataset(dataset.id, {
      ...fitSpecs['linear, income, HC1'],
      fixedEffects: ['shore'],
    });
    expect(single.error).toMatchObject({ code: 'single-level', field: 'fixedEffects' });
    expect(single.error!.message).toContain('shore has a single level');
    const itself = await fitDataset(dataset.id, {
      ...fitSpecs['linear, income, HC1'],
      instruments: ['price'],
    });
    expect(itself.error).toMatchObject({ code: 'instrument-is-price', field: 'instruments.0' });
    const spec = await researcher.post(`/api/studies/${studyId}/datasets/${dataset.id}/fits`, {
      spec: { ...fitSpecs['linear, income, HC1'], instruments: ['income'] },
    });
    expect(spec.status).toBe(400);
    expect(spec.body.error.issues[0].path).toBe('spec.instruments.0');
  });

  it('stores nothing for a fit whose dataset was deleted', async () => {
    const dataset = await importFile(
      'short-lived.csv',
      Buffer.from(csvText(salesHeader, salesRows(30, 17))),
    );
    const [row] = await deps.db
      .insert(datasetFits)
      .values({ studyId, datasetId: dataset.id, spec: fitSpecs['linear, income, HC1'] })
      .returning();
    expect((await researcher.delete(`/api/studies/${studyId}/datasets/${dataset.id}`)).status).toBe(
      204,
    );
    expect(await tableExists(dataset.id)).toBe(false);
    await runDatasetFit(deps.db, row.id);
    const fit = await researcher.get(`/api/studies/${studyId}/dataset-fits/${row.id}`);
    expect(fit.body).toMatchObject({
      status: 'failed',
      result: null,
      error: { code: 'dataset-deleted' },
    });
  });

  it('refuses to delete a dataset a published schedule rests on', async () => {
    const dataset = await importFile(
      'published.csv',
      Buffer.from(csvText(salesHeader, salesRows(30, 19))),
    );
    const [fit] = await deps.db
      .insert(fits)
      .values({ studyId, spec: { datasetId: dataset.id }, status: 'done' })
      .returning();
    await deps.db.insert(scheduleVersions).values({
      studyId,
      fitId: fit.id,
      version: 1,
      title: 'From outlet sales',
      method: 'dataset-demand',
      spec: { datasetId: dataset.id },
      n: 30,
      dataHash: dataset.contentHash,
      schedule: {},
      publishedByName: 'Test',
    });
    const refused = await researcher.delete(`/api/studies/${studyId}/datasets/${dataset.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('dataset-in-use');
    expect(await tableExists(dataset.id)).toBe(true);
  });
});
