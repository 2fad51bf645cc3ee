import fc from 'fast-check';
import request from 'supertest';
import type { AccessRule } from '../../server/auth/access-rule';
import { accessPolicy } from '../../server/auth/access-policy';
import { createFuzzContext, pathParameter, type FuzzContext } from '../support/fuzz/fuzz-context';
import { hostileJsonText, hostileText, hostileValue } from '../support/fuzz/hostile-values';
import { mutatedSample } from '../support/fuzz/mutate-sample';
import { organisationRowCounts, uncountedTables } from '../support/fuzz/organisation-row-counts';
import { sampleBodies } from '../support/fuzz/sample-bodies';
import { createTestApp } from '../support/test-app';

/**
 * Every state-changing route of the access policy, called with generated bodies: valid,
 * near-valid (the route's sample with one place made hostile) and hostile (NUL, broken
 * characters, bidi marks, huge text, deep nesting, extreme numbers and dates, prototype keys,
 * broken JSON), and with hostile path parameters. Every answer must be 2xx or a 4xx that says
 * what is wrong — never 5xx — and a 4xx must leave every table as it was. Seeded; `npm run
 * fuzz` runs longer (FUZZ_RUNS calls per route, FUZZ_SEED to replay).
 */
const runsPerRoute = Number(process.env['FUZZ_RUNS'] ?? 60);
const seed = Number(process.env['FUZZ_SEED'] ?? 20271205);

const testApp = createTestApp();
const { db } = testApp.deps;
const writeRules = accessPolicy.filter((rule) => rule.method !== 'GET');
const ruleKey = (rule: AccessRule) => `${rule.method} ${rule.path}`;
let context: FuzzContext;

beforeAll(async () => {
  context = await createFuzzContext(testApp);
}, 60_000);

afterAll(async () => {
  await db.$client.end();
});

/** A body as sent on the wire: JSON of a value, or a raw text. */
type WireBody = { json: unknown } | { raw: string } | undefined;

function bodiesFor(rule: AccessRule): fc.Arbitrary<WireBody> {
  const sample = sampleBodies[ruleKey(rule)](context);
  const json = (value: unknown): WireBody => ({ json: value });
  return fc.oneof(
    { arbitrary: fc.constant(sample === undefined ? undefined : json(sample)), weight: 1 },
    { arbitrary: mutatedSample(sample ?? {}).map(json), weight: 4 },
    { arbitrary: hostileValue.map(json), weight: 2 },
    { arbitrary: hostileJsonText.map((raw): WireBody => ({ raw })), weight: 1 },
  );
}

/** The rule's path with well-formed parameters, or one of them made hostile. */
function pathsFor(rule: AccessRule): fc.Arbitrary<string> {
  const names = [...rule.path.matchAll(/:(\w+)/g)].map((m) => m[1]);
  const filled = (hostile?: { name: string; value: string }) =>
    rule.path.replace(/:(\w+)/g, (_, name: string) =>
      hostile?.name === name ? hostile.value : encodeURIComponent(pathParameter(name, context)),
    );
  if (names.length === 0) return fc.constant(filled());
  const hostileSegment = fc.oneof(
    fc.constantFrom(
      '%',
      '%E0%A4%A',
      '%00',
      '%C0%AF',
      'NaN',
      '-1',
      '1e999',
      '..',
      '%2e%2e',
      'x'.repeat(3000),
    ),
    hostileText.map((text) => encodeURIComponent(text.slice(0, 200)) || 'x'),
  );
  return fc.oneof(
    { arbitrary: fc.constant(filled()), weight: 3 },
    {
      arbitrary: fc
        .tuple(fc.constantFrom(...names), hostileSegment)
        .map(([name, value]) => filled({ name, value })),
      weight: 1,
    },
  );
}

function agentFor(rule: AccessRule) {
  const role = Array.isArray(rule.access) ? rule.access[0] : 'researcher';
  return context.agents[role as keyof FuzzContext['agents']];
}

async function send(rule: AccessRule, path: string, body: WireBody) {
  const agent = agentFor(rule);
  const method = rule.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
  const client = request(testApp.app);
  let call = client[method](path).set('Cookie', agent.cookie).set('x-csrf-token', agent.csrfToken);
  if (body && 'raw' in body) call = call.set('Content-Type', 'application/json').send(body.raw);
  else if (body)
    call = call.send(JSON.stringify(body.json) as never).set('Content-Type', 'application/json');
  return call;
}

/** A 4xx says what is wrong: a code and a message, and a 400 names the field or the body. */
function explainsRefusal(status: number, body: unknown): boolean {
  const error = (body as { error?: { code?: unknown; message?: unknown; issues?: unknown } })
    ?.error;
  if (typeof error?.code !== 'string' || typeof error.message !== 'string') return false;
  if (status !== 400) return true;
  const issues = error.issues as { path?: unknown }[] | undefined;
  // A file's problems name the line and the column instead of a field of the body.
  const problems = (body as { error: { problems?: { column?: unknown }[] } }).error.problems;
  if (Array.isArray(problems) && problems.length > 0)
    return problems.every((problem) => typeof problem.column === 'string');
  return (
    error.code === 'malformed-body' ||
    (Array.isArray(issues) &&
      issues.length > 0 &&
      issues.every((issue) => typeof issue.path === 'string' && issue.path.length > 0))
  );
}

describe('every write route of the access policy', () => {
  it('has a sample body in the fuzzer, so no new route escapes it', () => {
    const missing = writeRules.map(ruleKey).filter((key) => !(key in sampleBodies));
    expect(missing).toEqual([]);
    const stale = Object.keys(sampleBodies).filter(
      (key) => !writeRules.some((r) => ruleKey(r) === key),
    );
    expect(stale).toEqual([]);
  });

  it('has every table counted by the nothing-stored check', async () => {
    expect(await uncountedTables(db)).toEqual([]);
  });

  it.each(writeRules.map((rule) => [ruleKey(rule), rule] as const))(
    '%s answers generated bodies with 2xx or an explained 4xx, storing nothing on a 4xx',
    async (_key, rule) => {
      if (!(ruleKey(rule) in sampleBodies)) throw new Error(`No sample body for ${ruleKey(rule)}`);
      const organisationId = context.setup.organisation.id;
      await fc.assert(
        fc.asyncProperty(pathsFor(rule), bodiesFor(rule), async (path, body) => {
          const before = await organisationRowCounts(db, organisationId);
          const response = await send(rule, path, body);
          const what = `${rule.method} ${path.slice(0, 200)} → ${response.status} ${JSON.stringify(response.body).slice(0, 300)}`;
          if (
            response.status >= 500 ||
            response.status < 200 ||
            (response.status >= 300 && response.status < 400)
          )
            throw new Error(what);
          if (response.status >= 400) {
            if (!explainsRefusal(response.status, response.body))
              throw new Error(`unexplained: ${what}`);
            const after = await organisationRowCounts(db, organisationId);
            expect({ what, after }).toEqual({ what, after: before });
          }
        }),
        { seed, numRuns: runsPerRoute, endOnFailure: true },
      );
    },
    Math.max(120_000, runsPerRoute * 3_000),
  );
});
