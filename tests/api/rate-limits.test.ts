import { randomUUID } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { apiErrorSchema } from '@shared/http/api-error';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDependencies } from '../../server/create-dependencies';
import { startIdentityProvider } from '../../tools/stack/identity-provider/identity-provider';
import { freePort } from '../../tools/stack/free-port';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { createTestOrganisation } from '../support/test-organisation';

// An app of its own with low limits; its counters carry a prefix of their own, so neither the
// stack's server nor another run shares them.
const deps = createDependencies(
  loadConfig({
    ...process.env,
    RATE_SIGN_IN_PER_ADDRESS: '2',
    RATE_TOKEN_FAILURES_PER_ADDRESS: '3',
    RATE_SYNC_PER_USER: '2',
    RATE_WRITES_PER_USER: '3',
    RATE_LIMIT_KEY_PREFIX: `test-${randomUUID().slice(0, 8)}`,
  }),
);
const app = createApp(deps);
let enumerator: SignedInAgent;
let researcher: SignedInAgent;

beforeAll(async () => {
  const organisation = await createTestOrganisation(deps.db, 'Rate limits');
  const sign = (userId: string) =>
    signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
      userId,
      organisationId: organisation.id,
    });
  enumerator = await sign(organisation.people.enumerator.userId);
  researcher = await sign(organisation.people.researcher.userId);
});

afterAll(async () => {
  await deps.db.$client.end();
});

/** A 429 with a whole number of seconds to wait and JSON naming the limit. */
function expectLimited(response: request.Response, limit: string) {
  expect(response.status).toBe(429);
  expect(Number(response.headers['retry-after'])).toBeGreaterThanOrEqual(1);
  const body = apiErrorSchema.parse(response.body);
  expect(body.error).toMatchObject({ code: 'rate-limited', limit });
  expect(body.error.message).toMatch(/Try again in \d+ s\./);
}

it('limits state-changing calls per person, counting refused ones too', async () => {
  for (let i = 0; i < 3; i += 1)
    expect((await researcher.post('/api/studies', { name: '' })).status).toBe(400);
  expectLimited(await researcher.post('/api/studies', { name: '' }), 'writes-per-person');
  // Reads are not counted.
  expect((await researcher.get('/api/studies')).status).toBe(200);
});

it('limits sync batches per person apart from other writes', async () => {
  for (let i = 0; i < 2; i += 1)
    expect((await enumerator.post('/api/field/sync', { interviews: [] })).status).toBe(400);
  expectLimited(await enumerator.post('/api/field/sync', { interviews: [] }), 'sync-per-person');
});

it('limits refused access tokens per address, and then refuses even a guess that might fit', async () => {
  const guess = () =>
    request(app).get('/api/v1/schedules').set('Authorization', `Bearer fct_${randomUUID()}`);
  for (let i = 0; i < 3; i += 1) expect((await guess()).status).toBe(401);
  // The refusals are counted as their answers finish; wait for the last count to land.
  let last = await guess();
  for (let i = 0; i < 20 && last.status === 401; i += 1) {
    await new Promise((resolve) => setTimeout(resolve, 50));
    last = await guess();
  }
  expectLimited(last, 'token-failures-per-address');
});

it('limits sign-in attempts per address', async () => {
  const start = () => request(app).get('/auth/sign-in');
  for (let i = 0; i < 2; i += 1) expect((await start()).status).toBe(302);
  expectLimited(await start(), 'sign-in-per-address');
});

it('limits wrong passwords at the identity stand-in per account', async () => {
  const port = await freePort();
  const idp = await startIdentityProvider({
    dir: mkdtempSync(join(tmpdir(), 'fieldcurve-idp-')),
    port,
    clientId: 'limits',
    clientSecret: 'limits-secret',
    redirectUris: ['http://127.0.0.1:9/auth/callback'],
    accounts: [{ email: 'ada.quill@example.test', name: 'Ada Quill', password: 'long-enough-pw' }],
    wrongPasswordLimits: { perAccount: 2, perAddress: 100 },
  });
  try {
    const attempt = (password: string) =>
      request(`http://127.0.0.1:${port}`)
        .post('/interaction/no-such-interaction/sign-in')
        .type('form')
        .send({ email: 'ada.quill@example.test', password });
    expect((await attempt('wrong-one')).status).toBe(401);
    expect((await attempt('wrong-two')).status).toBe(401);
    const limited = await attempt('long-enough-pw');
    expect(limited.status).toBe(429);
    expect(Number(limited.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(limited.text).toMatch(/Too many wrong passwords/);
  } finally {
    await idp.stop();
  }
});
