import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { contingentValuation as cv } from '../../../tests/fixtures/checks/contingent-valuation';
import { numberAt, valueAt } from '../../../tests/support/json-path';
import { vanWestendorp as vw } from '../../../tests/fixtures/checks/van-westendorp';

const root = new URL('../../../', import.meta.url).pathname;
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'fit-survey-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function fit(
  csv: string,
  args: string[],
): { status: number | null; stdout: string; stderr: string } {
  const file = join(dir, `${args[1]}-${Math.random().toString(36).slice(2)}.csv`);
  writeFileSync(file, csv);
  const result = spawnSync(
    process.execPath,
    [
      join(root, 'node_modules/tsx/dist/cli.mjs'),
      join(root, 'tools/fit.ts'),
      ...args,
      '--data',
      file,
    ],
    { cwd: root, encoding: 'utf8', timeout: 60000 },
  );
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('fit command with the survey methods', () => {
  it('prints the Van Westendorp price points as JSON', () => {
    const csv = [
      'too_cheap,cheap,expensive,too_expensive',
      ...vw.respondents.map((r) => r.join(',')),
    ].join('\n');
    const run = fit(csv, ['--method', 'price-thresholds']);
    expect(run.status).toBe(0);
    const out: unknown = JSON.parse(run.stdout);
    // CHECKS.md §4 (published: Van Westendorp 1976): OPP 9.75, IPP 10.5.
    expect(valueAt(out, 'n')).toBe(10);
    expect(numberAt(out, 'optimalPrice.price')).toBeCloseTo(vw.expected.optimal.price, 9);
    expect(numberAt(out, 'indifferencePrice.price')).toBeCloseTo(vw.expected.indifference.price, 9);
  });

  it('reads an empty upper cell of a payment card as the open top interval', () => {
    const { card, picks } = cv.paymentCard;
    const rows = picks.map((p) => `${p},${card[card.indexOf(p) + 1] ?? ''}`);
    const run = fit(['lower,upper', ...rows].join('\n'), ['--method', 'wtp-card']);
    expect(run.status).toBe(0);
    const out: unknown = JSON.parse(run.stdout);
    expect(valueAt(out, 'n')).toBe(10);
    expect(numberAt(out, 'medianWtp.estimate')).toBeGreaterThan(0);
  });

  it('names a missing column on stderr and exits non-zero', () => {
    const run = fit('bid,answer\n10,1\n20,0\n', ['--method', 'wtp-single']);
    expect(run.status).not.toBe(0);
    expect(run.stderr).toMatch(/yes/);
    expect(run.stdout).toBe('');
  });

  it('refuses an all-yes sample, which has no finite estimate', () => {
    const run = fit('bid,yes\n10,yes\n20,yes\n30,yes\n', ['--method', 'wtp-single']);
    expect(run.status).not.toBe(0);
    expect(run.stderr).toMatch(/no-finite-estimate/);
  });
});
