import request from 'supertest';
import { dependencyNames, healthReportSchema } from '@shared/health/health-report';
import { healthStatusSchema } from '@shared/health/health-status';
import { agentsFor } from '../support/study-agents';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';

// Asks the running server (started by `npm test` against the local stack), not an in-process app.
const appUrl = process.env['TEST_APP_URL']!;
const testApp = createTestApp();

afterAll(async () => {
  await testApp.deps.db.$client.end();
});

describe('GET /api/health', () => {
  it('tells anyone only whether the service is ok, without signing in', async () => {
    const response = await fetch(`${appUrl}/api/health`);
    const body: unknown = await response.json();
    expect(response.status).toBe(200);
    // Strict: no version, bucket, issuer or timing reaches an anonymous caller.
    expect(healthStatusSchema.parse(body)).toEqual({ status: 'ok' });
    expect(response.headers.get('cache-control')).toBe('no-store');
  });
});

describe('GET /api/health/details', () => {
  it('gives an admin each dependency’s probe', async () => {
    const agents = await agentsFor(
      testApp,
      await createTestOrganisation(testApp.deps.db, 'Health'),
    );
    const response = await agents.admin.get('/api/health/details');
    const report = healthReportSchema.parse(response.body);
    expect(response.status).toBe(200);
    expect(report.status).toBe('ok');
    expect(Object.keys(report.checks).sort()).toEqual([...dependencyNames].sort());
    for (const name of dependencyNames) {
      expect({ name, ok: report.checks[name]?.ok }).toEqual({ name, ok: true });
    }
    // Within the probe's 15 s the same probe answers again rather than a new one.
    const again = await agents.admin.get('/api/health/details');
    expect(again.body).toEqual(response.body);

    expect((await agents.researcher.get('/api/health/details')).status).toBe(403);
  });

  it('is closed to anonymous callers', async () => {
    expect((await request(testApp.app).get('/api/health/details')).status).toBe(401);
  });
});
