import { jest } from '@jest/globals';
import { eq, sql } from 'drizzle-orm';
import request from 'supertest';
import type { IssuedApiToken } from '@shared/analysis/api-token';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { portalSchedulePath } from '@shared/analysis/portal-paths';
import { estimateCaution, type ScheduleVersion } from '@shared/analysis/schedule-version';
import { loadFitInput } from '../../server/analysis/load-fit-input';
import { runFit } from '../../server/analysis/run-fit';
import { fits, scheduleVersions } from '../../server/db/schema';
import { stopFitSenders } from '../../server/fits/fit-sender';
import { reportMoney } from '../../server/schedules/downloads/report-money';
import { reportNumber } from '../../server/schedules/downloads/report-number';
import { scheduleCells, scheduleColumns } from '../../server/schedules/downloads/schedule-table';
import { insertLanternData } from '../support/analysis-study';
import { commonSpec, shelfLogLog } from '../support/fit-specs';
import { firstLink, sinkMessages, waitForMessageTo } from '../support/mail-sink-client';
import { binaryParser, pdfText, xlsxRows } from '../support/parse-downloads';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertPerson, insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import {
  createTestOrganisation,
  type TestOrganisation,
  type TestPerson,
} from '../support/test-organisation';

jest.setTimeout(180_000);

const { app, deps } = createTestApp();
let organisation: TestOrganisation;
let otherClient: TestPerson;
let studyId: string;
let otherStudyId: string;
const as = {} as Record<'researcher' | 'client' | 'otherClient', SignedInAgent>;
const ladder: FitSpec = { method: 'price-ladder', ...commonSpec };

beforeAll(async () => {
  organisation = await createTestOrganisation(deps.db, 'Schedules');
  const { people } = organisation;
  otherClient = await insertPerson(deps.db, organisation.id, 'client', 'otherclient');
  studyId = await insertStudy(deps.db, organisation.id, [
    { person: people.researcher, roles: ['researcher'] },
    { person: people.client, roles: ['client'] },
  ]);
  otherStudyId = await insertStudy(deps.db, organisation.id, [
    { person: people.researcher, roles: ['researcher'] },
    { person: otherClient, roles: ['client'] },
  ]);
  await insertLanternData(deps.db, studyId);
  await insertLanternData(deps.db, otherStudyId);
  const sign = (userId: string) =>
    signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
      userId,
      organisationId: organisation.id,
    });
  as.researcher = await sign(people.researcher.userId);
  as.client = await sign(people.client.userId);
  as.otherClient = await sign(otherClient.userId);
});

afterAll(async () => {
  await stopFitSenders();
  await deps.db.$client.end();
});

/** Asks for a fit and waits until a worker of the stack has finished it. */
async function finishedFit(study: string, spec: FitSpec): Promise<string> {
  const response = await as.researcher.post(`/api/studies/${study}/fits`, { spec });
  expect(response.status).toBe(202);
  const id = response.body.fitId as string;
  for (let i = 0; i < 600; i++) {
    const [row] = await deps.db.select({ status: fits.status }).from(fits).where(eq(fits.id, id));
    if (row.status === 'done') return id;
    if (row.status === 'failed') throw new Error(`fit ${id} failed`);
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`fit ${id} did not finish`);
}

async function publish(study: string, body: object) {
  return as.researcher.post(`/api/studies/${study}/schedules`, body);
}

describe('publishing', () => {
  let firstFit: string;
  let first: ScheduleVersion;

  beforeAll(async () => {
    firstFit = await finishedFit(studyId, ladder);
    const response = await publish(studyId, { fitId: firstFit, title: 'Lantern purchase share' });
    expect(response.status).toBe(201);
    first = response.body as ScheduleVersion;
  });

  it('publishes a fit as version 1 with its grid, band, n and data hash', async () => {
    const [fit] = await deps.db.select().from(fits).where(eq(fits.id, firstFit));
    const result = fit.result as { schedule: { rows: unknown[] }; n: number; dataHash: string };
    expect(first).toMatchObject({
      version: 1,
      replacesId: null,
      n: result.n,
      dataHash: result.dataHash,
      method: 'price-ladder',
    });
    expect(first.rows).toEqual(result.schedule.rows);
    expect(first.caution).toBe(estimateCaution);
  });

  it('e-mails the study’s client a link to the schedule in the portal', async () => {
    const message = await waitForMessageTo(organisation.people.client.email);
    expect(message.subject).toContain('Lantern purchase share');
    expect(firstLink(message)).toBe(
      `${deps.config.APP_URL}${portalSchedulePath(studyId, first.id)}`,
    );
  });

  it('never changes a published version: the database refuses UPDATE and DELETE', async () => {
    const row = eq(scheduleVersions.id, first.id);
    const refused = {
      cause: { message: expect.stringMatching(/is published and cannot be changed or deleted/) },
    };
    await expect(
      deps.db.update(scheduleVersions).set({ title: 'Edited' }).where(row),
    ).rejects.toMatchObject(refused);
    await expect(deps.db.delete(scheduleVersions).where(row)).rejects.toMatchObject(refused);
    const [still] = await deps.db.select().from(scheduleVersions).where(row);
    expect(still.title).toBe('Lantern purchase share');
  });

  it('publishes a correction as a new version that names the one it replaces', async () => {
    const corrected = await finishedFit(studyId, { ...ladder, filters: { flagged: 'exclude' } });
    const response = await publish(studyId, {
      fitId: corrected,
      title: 'Lantern purchase share',
      replaces: first.id,
    });
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ version: 2, replacesId: first.id });
    const old = await as.client.get(`/api/studies/${studyId}/schedules/${first.id}`);
    expect(old.body).toMatchObject({ version: 1, replacedById: response.body.id });
    const mail = await mailWithSubject(organisation.people.client.email, '(version 2)');
    expect(mail.text).toContain('It replaces version 1, which stays available for reference.');
    expect(mail.text).not.toContain('first version');
    const twice = await publish(studyId, { fitId: corrected, title: 'Again', replaces: first.id });
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('already-replaced');
    const foreign = await publish(studyId, {
      fitId: corrected,
      title: 'Foreign',
      replaces: (await otherVersion()).id,
    });
    expect(foreign.status).toBe(404);
  });

  it('refuses to publish a fit that a version in force already has, and says which', async () => {
    const fitId = await finishedFit(studyId, { ...ladder, confidenceLevel: 0.9 });
    const once = await publish(studyId, { fitId, title: 'Lantern share, 90 % bands' });
    expect(once.status).toBe(201);
    const before = await versionCount(studyId);
    const again = await publish(studyId, { fitId, title: 'Lantern share, 90 % bands' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already-published');
    expect(again.body.error.message).toContain(`already published as version ${once.body.version}`);
    const renamed = await publish(studyId, { fitId, title: 'Another title' });
    expect(renamed.body.error.code).toBe('already-published');
    expect(await versionCount(studyId)).toBe(before);
  });

  it('refuses a second schedule in force under the title of another', async () => {
    const fitId = await finishedFit(studyId, { ...ladder, confidenceLevel: 0.8 });
    const before = await versionCount(studyId);
    const response = await publish(studyId, { fitId, title: 'lantern share, 90 % bands' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('title-in-use');
    expect(response.body.error.message).toMatch(/Choose it under Replaces/);
    expect(await versionCount(studyId)).toBe(before);
  });

  it('answers an empty title with the field’s own message, once', async () => {
    const response = await publish(studyId, { fitId: firstFit, title: '  ' });
    expect(response.status).toBe(400);
    expect(response.body.error.message).toBe('Give the schedule a title.');
    expect(response.body.error.issues).toEqual([
      { path: 'title', message: 'Give the schedule a title' },
    ]);
  });

  it('refuses a schedule whose cells rest on fewer than five respondents, naming them', async () => {
    const wide = await finishedFit(studyId, {
      ...shelfLogLog,
      priceGrid: { from: 200, to: 6000, steps: 30 },
    });
    const before = await versionCount(studyId);
    const response = await publish(studyId, { fitId: wide, title: 'Too wide' });
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('too-few-respondents');
    const issues = response.body.error.issues as { path: string; message: string }[];
    expect(issues.length).toBeGreaterThan(0);
    expect(issues[0].path).toBe('price:200');
    expect(issues[0].message).toMatch(
      /^At [A-Z]{3}\s200 the schedule rests on (1 respondent|\d respondents); at least 5 are needed\.$/,
    );
    expect(response.body.error.message).not.toContain('(s)');
    expect(await versionCount(studyId)).toBe(before);
  });

  it('refuses a fit that has not finished', async () => {
    const [queued] = await deps.db
      .insert(fits)
      .values({
        studyId,
        spec: ladder,
        status: 'queued',
        createdBy: organisation.people.researcher.userId,
      })
      .returning({ id: fits.id });
    const response = await publish(studyId, { fitId: queued.id, title: 'Early' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('fit-not-done');
  });
});

/** The newest message to an address whose subject contains some text (delivery is asynchronous). */
async function mailWithSubject(address: string, subject: string) {
  for (let i = 0; i < 50; i++) {
    const found = (await sinkMessages()).find(
      (m) => m.to.includes(address) && m.subject.includes(subject),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No message "${subject}" to ${address}`);
}

async function versionCount(study: string): Promise<number> {
  const [row] = await deps.db
    .select({ n: sql<number>`count(*)` })
    .from(scheduleVersions)
    .where(eq(scheduleVersions.studyId, study));
  return Number(row.n);
}

let otherVersionCache: ScheduleVersion | undefined;
async function otherVersion(): Promise<ScheduleVersion> {
  if (otherVersionCache) return otherVersionCache;
  const fitId = await finishedFit(otherStudyId, ladder);
  const response = await publish(otherStudyId, { fitId, title: 'Other study schedule' });
  expect(response.status).toBe(201);
  otherVersionCache = response.body as ScheduleVersion;
  return otherVersionCache;
}

describe('the client’s access', () => {
  let published: ScheduleVersion;
  beforeAll(async () => {
    const fitId = await finishedFit(studyId, shelfLogLog);
    published = (await publish(studyId, { fitId, title: 'Shelf demand' })).body as ScheduleVersion;
    await otherVersion();
  });

  it('lets a client read the published schedules of their study, and nothing unpublished', async () => {
    const list = await as.client.get(`/api/studies/${studyId}/schedules`);
    expect(list.status).toBe(200);
    expect((list.body as ScheduleVersion[]).map((v) => v.id)).toContain(published.id);
    expect((await as.client.get(`/api/studies/${studyId}/fits`)).status).toBe(403);
    expect((await as.client.get(`/api/studies/${studyId}/fits/${published.fitId}`)).status).toBe(
      403,
    );
    expect(
      (
        await as.client.post(`/api/studies/${studyId}/schedules`, {
          fitId: published.fitId,
          title: 'x',
        })
      ).status,
    ).toBe(403);
  });

  it('shows a client nothing of other studies', async () => {
    const other = await otherVersion();
    expect((await as.client.get(`/api/studies/${otherStudyId}/schedules`)).status).toBe(404);
    expect(
      (await as.client.get(`/api/studies/${otherStudyId}/schedules/${other.id}/download.csv`))
        .status,
    ).toBe(404);
    expect((await as.client.get(`/api/studies/${studyId}/schedules/${other.id}`)).status).toBe(404);
    const mine = (await as.client.get('/api/portal/schedules')).body as ScheduleVersion[];
    expect(new Set(mine.map((v) => v.studyId))).toEqual(new Set([studyId]));
    const theirs = (await as.otherClient.get('/api/portal/schedules')).body as ScheduleVersion[];
    expect(theirs.map((v) => v.id)).toEqual([other.id]);
  });
});

describe('downloads, parsed back', () => {
  let version: ScheduleVersion;
  let engineRows: ScheduleVersion['rows'];

  beforeAll(async () => {
    const fitId = await finishedFit(studyId, shelfLogLog);
    version = (await publish(studyId, { fitId, title: 'Shelf demand for download' }))
      .body as ScheduleVersion;
    // The engine run in-process on the same data: what every download must carry.
    engineRows = runFit(await loadFitInput(deps.db, studyId, shelfLogLog.filters), shelfLogLog)
      .schedule!.rows;
  });

  const download = (extension: string) =>
    as.client
      .get(`/api/studies/${studyId}/schedules/${version.id}/download.${extension}`)
      .buffer(true)
      .parse(binaryParser);

  it('gives a CSV that starts with its header, with the engine’s numbers rounded and the note last', async () => {
    const response = await download('csv');
    expect(response.headers['content-type']).toMatch(/text\/csv/);
    expect(response.headers['content-disposition']).toContain(`-v${version.version}-estimate.csv`);
    const text = (response.body as Buffer).toString('utf8');
    const lines = text.trim().split('\r\n');
    expect(lines[0]).toBe([...scheduleColumns(version), 'Note'].join(','));
    const rounded = scheduleCells({ ...version, rows: engineRows });
    const cells = lines.slice(1).map((line) => line.split(',').slice(0, 8));
    expect(cells).toEqual(rounded.map((row) => row.map((c) => (c === null ? '' : String(c)))));
    expect(lines[1]).toMatch(
      /,"Estimate: demand schedule “Shelf demand for download”, version \d+,/,
    );
  });

  it('gives an XLSX whose cells hold the engine’s numbers', async () => {
    const response = await download('xlsx');
    const rows = await xlsxRows(response.body as Buffer, 'Schedule');
    expect(String(rows[0][0])).toMatch(/^Estimate: /);
    expect(rows[1]).toEqual(scheduleColumns(version));
    expect(rows.slice(2)).toEqual(
      engineRows.map((r) => [
        r.price,
        r.quantity,
        r.ciLow,
        r.ciHigh,
        r.revenue,
        r.elasticity,
        r.extrapolated ? 'yes' : 'no',
        r.respondents,
      ]),
    );
    const about = await xlsxRows(response.body as Buffer, 'About');
    expect(about).toContainEqual(['Data hash (SHA-256)', version.dataHash]);
    expect(about).toContainEqual(['Confidence level', '95 %']);
    expect(about).toContainEqual(['Specification: demand form', 'Log-log (constant elasticity)']);
    expect(JSON.stringify(about)).not.toContain('{\\"method');
    const published = about.find((row) => row[0] === 'Published');
    expect(String(published?.[1])).toMatch(/^\d{1,2} \w+ \d{4} at \d{2}:\d{2} UTC by /);
  });

  it('gives a PDF report with the method, n, intervals, data hash, caution and the engine’s numbers', async () => {
    const response = await download('pdf');
    expect(response.headers['content-type']).toBe('application/pdf');
    const text = (await pdfText(response.body as Buffer)).replace(/\s+/g, ' ');
    expect(text).toContain('Shelf demand for download');
    expect(text).toContain(version.methodLabel);
    expect(text).toContain(`n = ${version.n}`);
    expect(text).toContain('95 % confidence band');
    expect(text).toContain(version.dataHash);
    expect(text).toContain('Estimates, not advice');
    expect(text).toContain('essential goods');
    expect(text).toContain('95 % interval low');
    expect(text).toContain('95 % interval high');
    expect(text).toContain('Specification');
    const money = reportMoney(version.currency);
    for (const r of engineRows) {
      expect(text).toContain(
        `${money(r.price)} ${reportNumber(r.quantity)} ${reportNumber(r.ciLow)} ${reportNumber(r.ciHigh)} ${money(r.revenue)}`,
      );
    }
  });
});

describe('the read API', () => {
  let token: IssuedApiToken;
  let version: ScheduleVersion;

  beforeAll(async () => {
    const list = (await as.client.get(`/api/studies/${studyId}/schedules`))
      .body as ScheduleVersion[];
    version = (await as.client.get(`/api/studies/${studyId}/schedules/${list[0].id}`))
      .body as ScheduleVersion;
    const issued = await as.client.post('/api/portal/tokens', { name: 'Planning sheet' });
    expect(issued.status).toBe(201);
    token = issued.body as IssuedApiToken;
  });

  const withToken = (path: string, secret = token.token) =>
    request(app).get(path).set('Authorization', `Bearer ${secret}`);

  it('serves the token owner’s published schedules as JSON and CSV', async () => {
    const list = await withToken('/api/v1/schedules');
    expect(list.status).toBe(200);
    const ids = (list.body as ScheduleVersion[]).map((v) => v.id);
    expect(ids).toContain(version.id);
    expect(ids).not.toContain((await otherVersion()).id);
    expect((await withToken(`/api/v1/schedules/${version.id}`)).body).toEqual(version);
    const csv = await withToken(`/api/v1/schedules/${version.id}.csv`);
    const download = await as.client.get(
      `/api/studies/${studyId}/schedules/${version.id}/download.csv`,
    );
    expect(csv.text).toBe(download.text);
    expect((await withToken(`/api/v1/schedules/${(await otherVersion()).id}`)).status).toBe(404);
  });

  it('refuses callers without a valid token', async () => {
    expect((await request(app).get('/api/v1/schedules')).status).toBe(401);
    expect((await withToken('/api/v1/schedules', 'fct_not-a-token')).status).toBe(401);
    expect((await as.client.get('/api/v1/schedules')).status).toBe(403);
  });

  it('lists the token without its secret, and answers 401 once it is revoked', async () => {
    const tokens = (await as.client.get('/api/portal/tokens')).body as IssuedApiToken[];
    expect(tokens.find((t) => t.id === token.id)).toMatchObject({
      name: 'Planning sheet',
      revokedAt: null,
    });
    expect(JSON.stringify(tokens)).not.toContain(token.token);
    expect((await as.otherClient.delete(`/api/portal/tokens/${token.id}`)).status).toBe(404);
    const revoked = await as.client.delete(`/api/portal/tokens/${token.id}`);
    expect(revoked.body.revokedAt).not.toBeNull();
    expect((await withToken('/api/v1/schedules')).status).toBe(401);
  });

  it('serves an OpenAPI 3.1 document describing the read API', async () => {
    const response = await request(app).get('/api/v1/openapi.json');
    expect(response.status).toBe(200);
    expect(response.body.openapi).toBe('3.1.0');
    expect(Object.keys(response.body.paths as object)).toEqual([
      '/schedules',
      '/schedules/{versionId}',
      '/schedules/{versionId}.csv',
    ]);
    expect(response.body.components.schemas.ScheduleVersion.properties.rows.type).toBe('array');
    expect(response.body.components.securitySchemes.accessToken.scheme).toBe('bearer');
  });
});
