import { parse } from 'csv-parse/sync';
import type { Role } from '@shared/auth/role';
import { rake } from '@shared/estimation/weighting/raking';
import type { RawDataDictionary } from '@shared/raw-data/raw-data-dictionary';
import { rawDataPath, rawDataQuery, type RawDataRequest } from '@shared/raw-data/raw-data-request';
import { binaryParser, xlsxRows } from '../support/parse-downloads';
import { insertRawDataStudy, type RawDataStudy } from '../support/raw-data-study';
import type { SignedInAgent } from '../support/signed-in-agent';
import { agentsFor } from '../support/study-agents';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';

const testApp = createTestApp();
const { db } = testApp.deps;
let study: RawDataStudy;
let agents: Record<Role, SignedInAgent>;
let outsider: SignedInAgent;

beforeAll(async () => {
  const organisation = await createTestOrganisation(db, 'Raw data');
  study = await insertRawDataStudy(db, organisation);
  agents = await agentsFor(testApp, organisation);
  const other = await createTestOrganisation(db, 'Other');
  outsider = (await agentsFor(testApp, other)).researcher;
});

afterAll(async () => {
  await db.$client.end();
});

const all: RawDataRequest = { filter: { flagged: 'include' } };
const url = (file: 'csv' | 'xlsx' | 'dictionary', request: RawDataRequest = all) =>
  `${rawDataPath(study.studyId, file)}?${rawDataQuery(request)}`;

async function csvOf(request: RawDataRequest = all, agent = agents.researcher) {
  const res = await agent.get(url('csv', request)).expect(200);
  expect(res.headers['content-type']).toMatch(/^text\/csv/);
  expect(res.headers['content-disposition']).toMatch(/attachment; filename=".+-interviews\.csv"/);
  const rows: Record<string, string>[] = parse(res.text, { columns: true });
  return {
    rows,
    header: res.text.split('\r\n')[0].split(','),
    byId: new Map(rows.map((r) => [r['interview_id'], r])),
  };
}

describe('raw interviews as CSV', () => {
  it('has one row per interview and one column per answer part, flags, review and place', async () => {
    const { rows, header, byId } = await csvOf();
    expect(rows).toHaveLength(5);
    expect(header).toEqual(
      expect.arrayContaining([
        'review_state',
        'review_note',
        'route_name',
        'point_code',
        'region',
        'enumerator_name',
        'started_at',
        'latitude',
        'flag.too-short',
        'consent.agreed',
        'ladder.at_1',
        'ladder.at_1.5',
        'ladder.at_3',
        'uses.first',
        'uses.second',
        'uses.third',
        'income.band',
        'size.people',
        'shelf.price',
        'shelf.pack_size',
        'shelf.quantity',
        'shelf.tag_photo',
        'remarks.value',
      ]),
    );
    expect(header).not.toContain('weight');
    const a = byId.get(study.ids.a)!;
    expect(a['review_state']).toBe('accepted');
    expect(a['route_name']).toBe('Lake road');
    expect(a['region']).toBe('North');
    expect(a['questionnaire_version']).toBe('1');
    expect(a['duration']).toBe('720'); // 12 minutes, exact arithmetic
    expect(a['latitude']).toBe('-1.0001');
    expect(a['ladder.at_1']).toBe('yes');
    expect(a['ladder.at_2']).toBe('no');
    expect(a['ladder.at_2.5']).toBe('');
    expect([a['uses.first'], a['uses.second'], a['uses.third']]).toEqual(['true', 'false', 'true']);
    expect(a['shelf.price']).toBe('2.5'); // 250 minor units of KES = 2.50 (2 decimals, ISO 4217)
    expect(a['flag.too-short']).toBe('false');
    expect(a['photos_stored']).toBe('1');
    const b = byId.get(study.ids.b)!;
    expect(b['review_state']).toBe('flagged');
    expect(b['flag.too-short']).toBe('true');
    expect(b['income.band']).toBe('');
    expect(b['shelf.price']).toBe('');
  });

  it('gives a stored photo an expiring presigned link', async () => {
    const { byId } = await csvOf();
    const link = new URL(byId.get(study.ids.a)!['shelf.tag_photo']);
    expect(link.pathname).toContain(study.photoKey);
    expect(link.searchParams.get('X-Amz-Expires')).toBe('86400');
    expect(link.searchParams.get('X-Amz-Signature')).toMatch(/^[0-9a-f]{64}$/);
  });

  it('neutralises text that a spreadsheet would run as a formula', async () => {
    const { byId } = await csvOf();
    expect(byId.get(study.ids.a)!['remarks.value']).toBe(
      `'=HYPERLINK("http://example.test","open")`,
    );
    expect(byId.get(study.ids.b)!['remarks.value']).toBe(`'@SUM(1)`);
    expect(byId.get(study.ids.b)!['review_note']).toBe(`'+1 call back`);
    expect(byId.get(study.ids.c)!['remarks.value']).toBe(`'-2+3`);
  });

  it('applies the analysis filter and the review states asked for', async () => {
    const ids = async (request: RawDataRequest) => [...(await csvOf(request)).byId.keys()].sort();
    expect(await ids({ filter: { flagged: 'exclude' } })).toEqual(
      [study.ids.a, study.ids.c, study.ids.d, study.ids.e].sort(),
    );
    expect(await ids({ filter: { flagged: 'include', regions: ['North'] } })).toEqual(
      [study.ids.a, study.ids.d].sort(),
    );
    expect(
      await ids({ filter: { flagged: 'include', from: '2027-03-05', to: '2027-03-10' } }),
    ).toEqual([study.ids.b, study.ids.c].sort());
    expect(await ids({ filter: { flagged: 'include' }, states: ['accepted'] })).toEqual(
      [study.ids.a, study.ids.c, study.ids.e].sort(),
    );
    expect(await ids({ filter: { flagged: 'include', routeIds: [crypto.randomUUID()] } })).toEqual(
      [],
    );
  });

  it('adds the raking weight when a weighting is chosen', async () => {
    const request: RawDataRequest = {
      filter: { flagged: 'include' },
      states: ['accepted'],
      weighting: { margins: [{ variable: 'region', targets: { North: 0.5, South: 0.5 } }] },
    };
    const { header, byId } = await csvOf(request);
    expect(header.at(-1)).toBe('weight');
    // One North and two South respondents raked to half and half, weights summing to 3: the
    // North one carries 1.5 and each South one 0.75 (exact arithmetic).
    expect(Number(byId.get(study.ids.a)!['weight'])).toBeCloseTo(1.5, 12);
    expect(Number(byId.get(study.ids.c)!['weight'])).toBeCloseTo(0.75, 12);
    expect(Number(byId.get(study.ids.e)!['weight'])).toBeCloseTo(0.75, 12);
  });

  it('weights as raking each interview on its own would, on two margins', async () => {
    const region: Record<string, number> = { North: 0.4, South: 0.6 };
    const income: Record<string, number> = { low: 0.5, high: 0.3, 'not-stated': 0.2 };
    const margins = [
      { variable: 'region' as const, targets: region },
      { variable: 'income-band' as const, targets: income },
    ];
    const request: RawDataRequest = {
      filter: { flagged: 'include' },
      states: ['accepted', 'flagged'],
      weighting: { margins },
    };
    const { byId } = await csvOf(request);
    // Second implementation: the product's raking over the four interviews one by one.
    const order = [study.ids.a, study.ids.b, study.ids.c, study.ids.e];
    const individual = rake({
      variables: {
        region: ['North', 'South', 'South', 'South'],
        'income-band': ['low', 'not-stated', 'high', 'low'],
      },
      targets: { region, 'income-band': income },
      tolerance: 1e-9,
    });
    order.forEach((id, i) => {
      expect(Number(byId.get(id)!['weight'])).toBeCloseTo(individual.weights[i], 9);
    });
  });
});

describe('raw interviews as XLSX', () => {
  it('has the same rows and columns, neutralised text and a dictionary sheet', async () => {
    const res = await agents.supervisor
      .get(url('xlsx'))
      .buffer(true)
      .parse(binaryParser)
      .expect(200);
    const body = res.body as Buffer;
    const rows = await xlsxRows(body, 'Interviews');
    const { header } = await csvOf();
    expect(rows[0]).toEqual(header);
    expect(rows).toHaveLength(6);
    const remarks = header.indexOf('remarks.value');
    const a = rows.find((r) => r[0] === study.ids.a)!;
    expect(a[remarks]).toBe(`'=HYPERLINK("http://example.test","open")`);
    expect(a[header.indexOf('shelf.price')]).toBe(2.5);
    expect(a[header.indexOf('uses.third')]).toBe(true);
    const dictionary = await xlsxRows(body, 'Dictionary');
    expect(dictionary[0]).toEqual([
      'column',
      'type',
      'unit',
      'allowed values',
      'questionnaire versions',
      'meaning',
    ]);
    expect(dictionary.slice(1).map((r) => r[0])).toEqual(header);
    const band = dictionary.find((r) => r[0] === 'income.band')!;
    expect(Array.from(band.slice(1, 5), (v) => v ?? '')).toEqual([
      'text',
      '',
      'low, middle, high',
      '1',
    ]);
  });
});

describe('the data dictionary', () => {
  it('explains every column of the download: type, unit, allowed values, version', async () => {
    const dictionary = (await agents.researcher.get(url('dictionary')).expect(200))
      .body as RawDataDictionary;
    const { header } = await csvOf();
    expect(dictionary.columns.map((c) => c.name)).toEqual(header);
    expect(dictionary.study).toEqual(
      expect.objectContaining({ id: study.studyId, currency: 'KES' }),
    );
    expect(dictionary.questionnaireVersions).toEqual([{ id: study.versionId, number: 1 }]);
    const column = (name: string) => dictionary.columns.find((c) => c.name === name)!;
    expect(column('shelf.price')).toEqual(
      expect.objectContaining({ type: 'number', unit: 'KES', questionnaireVersions: [1] }),
    );
    expect(column('shelf.pack_size').unit).toBe('piece');
    expect(column('ladder.at_1').allowed).toEqual(['yes', 'no']);
    expect(column('review_state').allowed).toEqual([
      'received',
      'flagged',
      'accepted',
      'returned',
      'rejected',
    ]);
    expect(column('duration')).toEqual(
      expect.objectContaining({ type: 'number', unit: 'seconds' }),
    );
    expect(column('shelf.tag_photo').type).toBe('url');
    expect(dictionary.photoLinkSeconds).toBe(86400);
    for (const c of dictionary.columns) expect(c.description.length).toBeGreaterThan(5);
  });

  it('lists the weight when a weighting is chosen', async () => {
    const request: RawDataRequest = {
      filter: { flagged: 'include' },
      weighting: { margins: [{ variable: 'region', targets: { North: 1, South: 1 } }] },
    };
    const dictionary = (await agents.researcher.get(url('dictionary', request)).expect(200))
      .body as RawDataDictionary;
    expect(dictionary.columns.at(-1)!.name).toBe('weight');
    expect(dictionary.weighting).toEqual(request.weighting);
  });
});

describe('bad requests', () => {
  const path = () => rawDataPath(study.studyId, 'csv');
  it.each([
    [
      'a date that is not a date',
      `filter=${encodeURIComponent('{"flagged":"include","from":"March"}')}`,
      'filter.from',
    ],
    ['filter text that is not JSON', 'filter=%7Bnope', 'filter'],
    ['a missing flagged choice', `filter=${encodeURIComponent('{}')}`, 'filter.flagged'],
    ['an unknown review state', 'states=accepted,lost', 'states.1'],
    ['an unknown parameter', 'limit=10', 'query'],
    [
      'weighting with one level',
      `weighting=${encodeURIComponent('{"margins":[{"variable":"region","targets":{"North":1}}]}')}`,
      'weighting.margins.0.targets',
    ],
  ])('refuses %s with 400 naming the field', async (_what, query, field) => {
    const res = await agents.researcher.get(`${path()}?${query}`).expect(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
  });

  it('refuses margins the interviews cannot meet, naming the weighting', async () => {
    const request: RawDataRequest = {
      filter: { flagged: 'include' },
      weighting: { margins: [{ variable: 'region', targets: { North: 0, South: 1 } }] },
    };
    const res = await agents.researcher.get(url('csv', request)).expect(400);
    expect(res.body.error.issues[0].path).toMatch(/^weighting/);
  });
});

describe('who may download', () => {
  it.each(['researcher', 'supervisor'] as const)('lets the study %s download', async (role) => {
    await agents[role].get(url('csv')).expect(200);
    await agents[role].get(url('dictionary')).expect(200);
  });

  it.each(['client', 'enumerator'] as const)('refuses the study %s', async (role) => {
    for (const file of ['csv', 'xlsx', 'dictionary'] as const) {
      const res = await agents[role].get(url(file));
      expect(res.status).toBe(403);
    }
  });

  it('refuses a researcher of another organisation', async () => {
    const res = await outsider.get(url('csv'));
    expect([403, 404]).toContain(res.status);
  });
});
