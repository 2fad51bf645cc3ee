import { dependencyNames, healthReportSchema } from '@shared/health/health-report';

// Asks the running server (started by `npm test` against the local stack), not an in-process app.
const appUrl = process.env['TEST_APP_URL']!;

describe('GET /api/health', () => {
  it('reports all four dependencies as ok, without signing in', async () => {
    const response = await fetch(`${appUrl}/api/health`);
    const report = healthReportSchema.parse(await response.json());

    expect(response.status).toBe(200);
    expect(report.status).toBe('ok');
    expect(Object.keys(report.checks).sort()).toEqual([...dependencyNames].sort());
    for (const name of dependencyNames) {
      expect({ name, ok: report.checks[name]?.ok }).toEqual({ name, ok: true });
    }
  });
});
