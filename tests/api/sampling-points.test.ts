import { count, eq } from 'drizzle-orm';
import { roles, type Role } from '@shared/auth/role';
import { samplingPoints } from '../../server/db/schema';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertPerson, insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const { app, deps } = createTestApp();
let organisation: TestOrganisation;
let studyId: string;
const agents = {} as Record<Role, SignedInAgent>;
let outsider: SignedInAgent;
let otherOrganisationSupervisor: SignedInAgent;

const header = 'point_code,point_name,point_kind,latitude,longitude,stratum,notes';
const goodRows = [
  'LKS-001,Blue door shop,shop,-0.0917,34.768,Lakeside,Opens at 8',
  'LKS-002,Stall by the jetty,market stall,-0.0921,34.7702,Lakeside,',
  'HIL-001,"Household, green gate",household,-0.1011,34.7555,Hillside,"Ask for the elder\nat the back"',
];
const csv = (...rows: string[]) => [header, ...rows].join('\n');
const importPath = () => `/api/studies/${studyId}/sampling-points/import`;
const listPath = () => `/api/studies/${studyId}/sampling-points`;

const sendCsv = (agent: SignedInAgent, text: string) =>
  agent.post(importPath()).set('Content-Type', 'text/csv').send(text);

async function storedCount(): Promise<number> {
  const [row] = await deps.db
    .select({ n: count() })
    .from(samplingPoints)
    .where(eq(samplingPoints.studyId, studyId));
  return row.n;
}

beforeAll(async () => {
  organisation = await createTestOrganisation(deps.db, 'Sampling points');
  const { people } = organisation;
  studyId = await insertStudy(deps.db, organisation.id, [
    { person: people.supervisor, roles: ['supervisor'] },
    { person: people.researcher, roles: ['researcher'] },
    { person: people.enumerator, roles: ['enumerator'] },
    { person: people.client, roles: ['client'] },
  ]);
  const sign = (who: { userId: string }, organisationId = organisation.id) =>
    signedInAgent(app, deps.db, deps.config.SESSION_SECRET, { userId: who.userId, organisationId });
  for (const role of roles) agents[role] = await sign(people[role]);
  outsider = await sign(await insertPerson(deps.db, organisation.id, 'supervisor', 'outsider'));
  const other = await createTestOrganisation(deps.db, 'Other sampling');
  otherOrganisationSupervisor = await sign(other.people.supervisor, other.id);
});

afterAll(async () => {
  await deps.db.$client.end();
});

describe('who may import and list sampling points', () => {
  it.each([
    ['supervisor', 200],
    ['researcher', 200],
    ['enumerator', 403],
    ['client', 403],
    ['admin', 403],
  ] as const)('answers a %s listing them with %i', async (role, status) => {
    expect((await agents[role].get(listPath())).status).toBe(status);
  });

  it.each(['researcher', 'enumerator', 'client', 'admin'] as const)(
    'refuses an import by a %s and stores nothing',
    async (role) => {
      const response = await sendCsv(agents[role], csv('ZZ-1,Shop,shop,1,2,North,'));
      expect(response.status).toBe(403);
      expect(await storedCount()).toBe(0);
    },
  );

  it('answers 404 to a supervisor who is not a member of the study', async () => {
    expect((await outsider.get(listPath())).status).toBe(404);
    expect((await sendCsv(outsider, csv(goodRows[0]))).status).toBe(404);
  });

  it('answers 404 to a supervisor of another organisation', async () => {
    expect((await otherOrganisationSupervisor.get(listPath())).status).toBe(404);
  });
});

describe('importing a sampling-point file', () => {
  it('stores nothing from a file whose one bad row comes after good ones', async () => {
    const response = await sendCsv(
      agents.supervisor,
      csv(...goodRows, 'LKS-004,Kiosk 4,kiosk,-0.09,34.77,,'),
    );
    expect(response.status).toBe(400);
    expect(response.body.error.problems).toEqual([
      { line: 6, column: 'stratum', message: 'Empty — every point needs a stratum or region.' },
    ]);
    expect(await storedCount()).toBe(0);
  });

  it('lists every problem of every bad row by line and column', async () => {
    const response = await sendCsv(
      agents.supervisor,
      csv(
        goodRows[0],
        'LKS-009,Kiosk,kiosk,123,34.77,Lakeside,',
        goodRows[1],
        'LKS-010,,tent,0,0,,',
      ),
    );
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('invalid-csv');
    expect(response.body.error.message).toMatch(/^Nothing was imported: the file has 4 problems/);
    expect(response.body.error.problems).toEqual([
      { line: 3, column: 'latitude', message: 'Latitude 123 is outside −90 to 90.' },
      { line: 5, column: 'point_name', message: 'Empty — every point needs a name.' },
      {
        line: 5,
        column: 'point_kind',
        message: '"tent" is not a kind; use one of household, shop, market_stall, kiosk, other.',
      },
      { line: 5, column: 'stratum', message: 'Empty — every point needs a stratum or region.' },
    ]);
    expect(await storedCount()).toBe(0);
  });

  it('refuses a file with a missing column, naming it on line 1', async () => {
    const response = await sendCsv(
      agents.supervisor,
      'point_code,point_name,latitude,longitude,stratum\nA,Shop,1,2,North',
    );
    expect(response.status).toBe(400);
    expect(response.body.error.problems).toEqual([
      { line: 1, column: 'point_kind', message: 'Missing column; it is required.' },
    ]);
    expect(await storedCount()).toBe(0);
  });

  it('refuses a PNG image renamed .csv with one problem and stores nothing', async () => {
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
    const response = await agents.supervisor
      .post(importPath())
      .set('Content-Type', 'text/csv')
      .send(png);
    expect(response.status).toBe(400);
    expect(response.body.error.problems).toEqual([
      {
        line: 1,
        column: '',
        message:
          'This file is not a CSV text file: save the sheet as CSV (comma-separated) and upload that.',
      },
    ]);
    expect(await storedCount()).toBe(0);
  });

  it('imports a good file and reports what it created', async () => {
    const response = await sendCsv(agents.supervisor, csv(...goodRows));
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ created: 3, updated: 0, unchanged: 0 });
    const listed = await agents.researcher.get(listPath());
    expect(listed.body.map((p: { code: string }) => p.code)).toEqual([
      'HIL-001',
      'LKS-001',
      'LKS-002',
    ]);
    expect(listed.body[0]).toMatchObject({
      name: 'Household, green gate',
      kind: 'household',
      latitude: -0.1011,
      longitude: 34.7555,
      notes: 'Ask for the elder\nat the back',
    });
    expect(listed.body[2].kind).toBe('market_stall');
  });

  it('changes nothing when the same file is uploaded again', async () => {
    const before = await agents.supervisor.get(listPath());
    const response = await sendCsv(agents.supervisor, csv(...goodRows));
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ created: 0, updated: 0, unchanged: 3 });
    expect(await storedCount()).toBe(3);
    const after = await agents.supervisor.get(listPath());
    expect(after.body).toEqual(before.body);
  });

  it('updates changed points and adds new codes on a re-upload, sent as JSON with BOM and CRLF', async () => {
    const changed = goodRows[0].replace('Blue door shop', 'Blue door shop (moved)');
    const text = `\uFEFF${[header, changed, goodRows[1], goodRows[2], 'LKS-003,Kiosk 3,kiosk,-0.09,34.77,Lakeside,'].join('\r\n')}\r\n`;
    const response = await agents.supervisor.post(importPath(), { csv: text });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ created: 1, updated: 1, unchanged: 2 });
    expect(response.body.points).toHaveLength(4);
    expect(await storedCount()).toBe(4);
  });

  it('keeps the stored values when a later file is refused', async () => {
    const response = await sendCsv(
      agents.supervisor,
      csv(goodRows[0].replace('Blue door shop', 'Renamed'), 'LKS-002,Stall,shop,1,200,Lakeside,'),
    );
    expect(response.status).toBe(400);
    const listed = await agents.supervisor.get(listPath());
    const first = listed.body.find((p: { code: string }) => p.code === 'LKS-001');
    expect(first.name).toBe('Blue door shop (moved)');
  });

  it('refuses a JSON body without the file', async () => {
    const response = await agents.supervisor.post(importPath(), { file: 'x' });
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('csv');
  });
});
