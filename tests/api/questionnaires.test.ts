import { and, eq } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import { everyKindQuestionnaire } from '@shared/questionnaire/every-kind-questionnaire';
import type {
  Questionnaire,
  QuestionnaireVersion,
} from '@shared/questionnaire/questionnaire-resource';
import { questionnaireVersions } from '../../server/db/schema';
import { isFrozenVersionError } from '../../server/questionnaires/frozen-version-error';
import type { SignedInAgent } from '../support/signed-in-agent';
import { agentsFor, smallDefinition, validStudy } from '../support/study-agents';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const testApp = createTestApp();
const { deps } = testApp;
let home: TestOrganisation;
let agents: Record<Role, SignedInAgent>;
let outsider: SignedInAgent;
let studyId: string;

beforeAll(async () => {
  home = await createTestOrganisation(deps.db, 'Questionnaires home');
  agents = await agentsFor(testApp, home);
  outsider = (await agentsFor(testApp, await createTestOrganisation(deps.db, 'Elsewhere')))
    .researcher;
  const study = await agents.researcher.post('/api/studies', {
    ...validStudy,
    name: 'Questionnaire study',
  });
  studyId = (study.body as { id: string }).id;
  for (const role of ['supervisor', 'enumerator', 'client'] as const) {
    const added = await agents.researcher.put(
      `/api/studies/${studyId}/members/${home.people[role].userId}`,
      {
        roles: [role],
      },
    );
    expect(added.status).toBe(200);
  }
});

afterAll(async () => {
  await deps.db.$client.end();
});

async function newQuestionnaire(title = 'Household survey'): Promise<{ id: string; base: string }> {
  const response = await agents.researcher.post(`/api/studies/${studyId}/questionnaires`, {
    title,
  });
  expect(response.status).toBe(201);
  const id = (response.body as Questionnaire).id;
  return { id, base: `/api/studies/${studyId}/questionnaires/${id}` };
}

async function storedDefinition(base: string, version = 1): Promise<unknown> {
  const response = await agents.researcher.get(`${base}/versions/${version}`);
  return (response.body as QuestionnaireVersion).definition;
}

const withBlock = (index: number, change: object) => {
  const definition = everyKindQuestionnaire();
  definition.blocks[index] = {
    ...definition.blocks[index],
    ...change,
  } as (typeof definition.blocks)[number];
  return definition;
};

describe('creating and saving a questionnaire', () => {
  it('starts as draft version 1 holding a consent block', async () => {
    const { base } = await newQuestionnaire();
    const version = (await agents.researcher.get(`${base}/versions/1`))
      .body as QuestionnaireVersion;
    expect(version).toMatchObject({ version: 1, status: 'draft', blockCount: 1 });
    expect(version.definition.blocks.map((b) => b.kind)).toEqual(['consent']);
  });

  it('saves a draft holding every kind of block', async () => {
    const { base } = await newQuestionnaire();
    const response = await agents.researcher.put(`${base}/draft`, {
      definition: everyKindQuestionnaire(),
    });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ version: 1, status: 'draft', blockCount: 16 });
    expect(await storedDefinition(base)).toEqual(everyKindQuestionnaire());
  });

  it.each([
    [
      'a ladder whose prices do not increase',
      withBlock(1, { pricesMinor: [200, 150] }),
      'definition.blocks.1.pricesMinor.1',
      'Each price must be higher than the one before: price 2 is not',
    ],
    [
      'a bid design with no bids',
      withBlock(5, { bidDesign: { levels: [] } }),
      'definition.blocks.5.bidDesign.levels',
      'A bid design needs at least one bid',
    ],
    [
      'a payment card whose amounts fall',
      withBlock(4, { amountsMinor: [300, 100] }),
      'definition.blocks.4.amountsMinor.1',
      'Each amount must be higher than the one before: amount 2 is not',
    ],
    [
      'consent that is not first',
      { blocks: [...everyKindQuestionnaire().blocks.slice(1), everyKindQuestionnaire().blocks[0]] },
      'definition.blocks.15.kind',
      'Consent must be the first block',
    ],
    [
      'a condition on a later block',
      withBlock(2, { showIf: { blockId: 'number', test: 'greater', value: 3 } }),
      'definition.blocks.2.showIf.blockId',
      'A condition can only look at an earlier block, not block 15, which comes later',
    ],
    [
      'a double-bounded follow-up that is not higher',
      withBlock(5, {
        bounds: 'double',
        bidDesign: { levels: [{ bidMinor: 200, afterYesMinor: 150, afterNoMinor: 100 }] },
      }),
      'definition.blocks.5.bidDesign.levels.0.afterYesMinor',
      'The follow-up after a yes must be higher than bid 1',
    ],
  ])(
    'refuses %s, naming the block and field, and stores nothing',
    async (_label, definition, path, message) => {
      const { base } = await newQuestionnaire();
      const before = await storedDefinition(base);
      const response = await agents.researcher.put(`${base}/draft`, { definition });
      expect(response.status).toBe(400);
      expect(response.body.error.code).toBe('invalid-questionnaire');
      expect(response.body.error.issues).toContainEqual({ path, message });
      expect(await storedDefinition(base)).toEqual(before);
    },
  );

  it('lists every problem at once', async () => {
    const { base } = await newQuestionnaire();
    const definition = withBlock(1, { pricesMinor: [200, 150] });
    definition.blocks[5] = {
      ...definition.blocks[5],
      bidDesign: { levels: [] },
    } as (typeof definition.blocks)[number];
    definition.blocks[7] = { ...definition.blocks[7], id: 'number' };
    const response = await agents.researcher.put(`${base}/draft`, { definition });
    expect(response.body.error.issues.map((i: { path: string }) => i.path)).toEqual([
      'definition.blocks.1.pricesMinor.1',
      'definition.blocks.5.bidDesign.levels',
      'definition.blocks.14.id',
    ]);
    expect(response.body.error.message).toBe('The questionnaire is not valid: 3 problems to fix.');
  });
});

describe('publishing and new drafts', () => {
  let base: string;
  let questionnaireId: string;
  beforeAll(async () => {
    ({ base, id: questionnaireId } = await newQuestionnaire('Versioned'));
    expect(
      (await agents.researcher.put(`${base}/draft`, { definition: smallDefinition })).status,
    ).toBe(200);
  });

  it('refuses to publish a questionnaire with nothing after consent', async () => {
    const { base: empty } = await newQuestionnaire('Empty');
    const response = await agents.researcher.post(`${empty}/versions/1/publish`);
    expect(response.status).toBe(400);
    expect(response.body.error.issues).toEqual([
      {
        path: 'definition.blocks',
        message: 'Add at least one question after consent before publishing',
      },
    ]);
  });

  it('publishes a draft once; publishing again is a conflict', async () => {
    const published = await agents.researcher.post(`${base}/versions/1/publish`);
    expect(published.status).toBe(200);
    expect(published.body).toMatchObject({ version: 1, status: 'published' });
    expect(published.body.publishedAt).toEqual(expect.any(String));
    const again = await agents.researcher.post(`${base}/versions/1/publish`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('version-published');
  });

  it('refuses every change to the published version, through any route, storing nothing', async () => {
    const change = { definition: everyKindQuestionnaire() };
    const viaDraft = await agents.researcher.put(`${base}/draft`, change);
    const viaVersion = await agents.researcher.put(`${base}/versions/1`, change);
    const invalidViaVersion = await agents.researcher.put(`${base}/versions/1`, {
      definition: { blocks: [] },
    });
    for (const response of [viaDraft, viaVersion, invalidViaVersion]) {
      expect(response.status).toBe(409);
      expect(response.body.error.code).toBe('version-published');
    }
    expect(await storedDefinition(base)).toEqual(smallDefinition);
  });

  it('has the database refuse a direct change too, with an error the API maps to 409', async () => {
    const [row] = await deps.db
      .select({ id: questionnaireVersions.id })
      .from(questionnaireVersions)
      .where(
        and(
          eq(questionnaireVersions.questionnaireId, questionnaireId),
          eq(questionnaireVersions.version, 1),
        ),
      );
    let caught: unknown;
    try {
      await deps.db
        .update(questionnaireVersions)
        .set({ definition: { blocks: [] } })
        .where(eq(questionnaireVersions.id, row.id));
    } catch (error) {
      caught = error;
    }
    expect(isFrozenVersionError(caught)).toBe(true);
    await expect(
      deps.db.delete(questionnaireVersions).where(eq(questionnaireVersions.id, row.id)),
    ).rejects.toBeDefined();
    expect(await storedDefinition(base)).toEqual(smallDefinition);
  });

  it('starts version 2 as a copy of version 1, once', async () => {
    const created = await agents.researcher.post(`${base}/new-draft`);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      version: 2,
      status: 'draft',
      definition: smallDefinition,
    });
    const again = await agents.researcher.post(`${base}/new-draft`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('draft-exists');
  });

  it('edits the new draft and leaves version 1 as it was', async () => {
    const saved = await agents.researcher.put(`${base}/draft`, {
      definition: everyKindQuestionnaire(),
    });
    expect(saved.body).toMatchObject({ version: 2, blockCount: 16 });
    expect(await storedDefinition(base, 1)).toEqual(smallDefinition);
    const listed = (await agents.researcher.get(base)).body as Questionnaire;
    expect(listed.versions.map((v) => [v.version, v.status])).toEqual([
      [2, 'draft'],
      [1, 'published'],
    ]);
  });
});

describe('who sees and changes questionnaires', () => {
  let base: string;
  let draftOnly: string;
  beforeAll(async () => {
    ({ base } = await newQuestionnaire('Shared'));
    await agents.researcher.put(`${base}/draft`, { definition: smallDefinition });
    await agents.researcher.post(`${base}/versions/1/publish`);
    await agents.researcher.post(`${base}/new-draft`);
    ({ id: draftOnly } = await newQuestionnaire('Unpublished'));
  });

  it.each(['supervisor', 'enumerator'] as const)(
    'shows a %s of the study published versions only',
    async (role) => {
      const list = (await agents[role].get(`/api/studies/${studyId}/questionnaires`))
        .body as Questionnaire[];
      expect(list.map((q) => q.id)).not.toContain(draftOnly);
      const shared = list.find((q) => q.title === 'Shared');
      expect(shared?.versions.map((v) => v.version)).toEqual([1]);
      expect((await agents[role].get(`${base}/versions/1`)).status).toBe(200);
      expect((await agents[role].get(`${base}/versions/2`)).status).toBe(404);
    },
  );

  it.each(['supervisor', 'enumerator'] as const)('refuses a %s any change', async (role) => {
    expect(
      (await agents[role].post(`/api/studies/${studyId}/questionnaires`, { title: 'X' })).status,
    ).toBe(403);
    expect((await agents[role].put(`${base}/draft`, { definition: smallDefinition })).status).toBe(
      403,
    );
    expect((await agents[role].post(`${base}/versions/2/publish`)).status).toBe(403);
    expect((await agents[role].post(`${base}/new-draft`)).status).toBe(403);
  });

  it('shows a client member the study but not its questionnaires', async () => {
    expect((await agents.client.get(`/api/studies/${studyId}`)).status).toBe(200);
    expect((await agents.client.get(`/api/studies/${studyId}/questionnaires`)).status).toBe(403);
    expect((await agents.client.get(`${base}/versions/1`)).status).toBe(403);
  });

  it('answers 404 to a researcher of another organisation', async () => {
    expect((await outsider.get(`${base}/versions/1`)).status).toBe(404);
    expect((await outsider.put(`${base}/draft`, { definition: smallDefinition })).status).toBe(404);
  });

  it('answers 404 for a questionnaire reached through another study', async () => {
    const other = await agents.researcher.post('/api/studies', {
      ...validStudy,
      name: 'Other study',
    });
    const elsewhere = base.replace(studyId, (other.body as { id: string }).id);
    expect((await agents.researcher.get(`${elsewhere}/versions/1`)).status).toBe(404);
    expect(
      (await agents.researcher.put(`${elsewhere}/draft`, { definition: smallDefinition })).status,
    ).toBe(404);
  });

  it('refuses a version number that is not a whole number', async () => {
    const response = await agents.researcher.get(`${base}/versions/first`);
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('version');
  });
});
