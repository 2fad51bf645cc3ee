import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));
let dir: string;

function csv(name: string, lines: string[]): string {
  const path = join(dir, name);
  writeFileSync(path, `${lines.join('\n')}\n`);
  return path;
}

/** The parts of the command's JSON output these tests read. */
interface FitOutput {
  n: number;
  coefficients: {
    term: string;
    estimate: number;
    stdError: number;
    ciLow: number;
    ciHigh: number;
  }[];
  rSquared: number;
  form?: string;
  elasticities: { term: string; kind: string; estimate: number }[];
  standardErrors: { type: string };
  firstStages: { endogenous: string }[];
}

interface FitRun {
  status: number | null;
  stdout: string;
  stderr: string;
  json: FitOutput;
}

/** Runs the command as a user would (`npm run fit` is `tsx tools/fit.ts`). */
function fit(...args: string[]): FitRun {
  const run = spawnSync(process.execPath, ['--import', 'tsx', 'tools/fit.ts', ...args], {
    cwd: root,
    encoding: 'utf8',
  });
  let json = {} as FitOutput;
  try {
    json = JSON.parse(run.stdout) as FitOutput;
  } catch {
    // Refusals print nothing on stdout; the assertions then read stderr.
  }
  return { status: run.status, stdout: run.stdout, stderr: run.stderr, json };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'fit-cli-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));
// Each case spawns the command (a TypeScript start-up of about a second).
const SPAWN_TIMEOUT = 60_000;

describe('npm run fit -- --method ols', () => {
  it(
    'prints n and the coefficient rows of an ordinary least-squares fit',
    () => {
      // x = [1, 2, 3, 4], y = [1, 3, 2, 5]: β = (0, 1.1), computed here by hand.
      const data = csv('line.csv', ['x,y', '1,1', '2,3', '3,2', '4,5']);
      const { status, json } = fit('--method', 'ols', '--data', data, '--y', 'y', '--x', 'x');
      expect(status).toBe(0);
      expect(json.n).toBe(4);
      expect(json.coefficients.map((c) => c.term)).toEqual(['(intercept)', 'x']);
      expect(json.coefficients[0].estimate).toBeCloseTo(0, 12);
      expect(json.coefficients[1].estimate).toBeCloseTo(1.1, 12);
      for (const key of ['stdError', 'ciLow', 'ciHigh'] as const) {
        expect(typeof json.coefficients[1][key]).toBe('number');
      }
      expect(typeof json.rSquared).toBe('number');
    },
    SPAWN_TIMEOUT,
  );

  it(
    'fits a log-log demand curve with a weight column, fixed effects and HC1 errors',
    () => {
      // Constructed here: units = 80·price^−1.4 exactly, so the own-price elasticity is −1.4.
      const rows = [2, 2.5, 3, 3.5, 4, 4.5, 5, 5.5].map(
        (p, i) => `${p},${80 * p ** -1.4},${['hill', 'coast'][i % 2]},${1 + (i % 3)}`,
      );
      const data = csv('demand.csv', ['price,units,zone,w', ...rows]);
      const { status, json } = fit(
        '--method',
        'ols',
        '--data',
        data,
        '--y',
        'units',
        '--x',
        'price',
        '--form',
        'loglog',
        '--fixed-effects',
        'zone',
        '--weights',
        'w',
        '--se',
        'hc1',
      );
      expect(status).toBe(0);
      expect(json.n).toBe(8);
      expect(json.form).toBe('loglog');
      expect(json.elasticities[0]).toMatchObject({ term: 'price', kind: 'own-price' });
      expect(json.elasticities[0].estimate).toBeCloseTo(-1.4, 9);
      expect(json.coefficients.map((c) => c.term)).toContain('zone=hill');
      expect(json.standardErrors.type).toBe('hc1');
    },
    SPAWN_TIMEOUT,
  );

  it(
    'runs two-stage least squares with --instrument and --endogenous',
    () => {
      const rows = Array.from({ length: 12 }, (_, i) => {
        const cost = (i * 7) % 12;
        const shock = ((i * 5) % 7) - 3;
        const price = 3 + 0.5 * cost + 0.3 * shock;
        return `${price},${40 - 2 * price + shock},${cost}`;
      });
      const data = csv('market.csv', ['price,units,cost', ...rows]);
      const { status, json } = fit(
        '--method',
        'ols',
        '--data',
        data,
        '--y',
        'units',
        '--x',
        'price',
        '--instrument',
        'cost',
        '--endogenous',
        'price',
      );
      expect(status).toBe(0);
      expect(json.firstStages[0].endogenous).toBe('price');
      expect(json.n).toBe(12);
    },
    SPAWN_TIMEOUT,
  );

  it(
    'names a missing column on stderr and exits non-zero',
    () => {
      const data = csv('small.csv', ['price,units', '1,5', '2,4', '3,2']);
      const { status, stderr, stdout } = fit(
        '--method',
        'ols',
        '--data',
        data,
        '--y',
        'units',
        '--x',
        'prize',
      );
      expect(status).not.toBe(0);
      expect(stderr).toContain('"prize"');
      expect(stderr).toContain('missing-column');
      expect(stdout).toBe('');
    },
    SPAWN_TIMEOUT,
  );

  it(
    'names the column and data row of a cell that is not a number',
    () => {
      const data = csv('bad-cell.csv', ['price,units', '1,5', '2,four', '3,2', '4,1']);
      const { status, stderr } = fit(
        '--method',
        'ols',
        '--data',
        data,
        '--y',
        'units',
        '--x',
        'price',
      );
      expect(status).not.toBe(0);
      expect(stderr).toContain('column units, row 2');
    },
    SPAWN_TIMEOUT,
  );

  it(
    'refuses a non-positive quantity under a log with its row, and an unknown method',
    () => {
      const data = csv('zero.csv', ['price,units', '1,5', '2,4', '3,0', '4,1']);
      const zero = fit(
        '--method',
        'ols',
        '--data',
        data,
        '--y',
        'units',
        '--x',
        'price',
        '--form',
        'loglog',
      );
      expect(zero.status).not.toBe(0);
      expect(zero.stderr).toMatch(/column units, row 3: 0 is not positive/);
      const unknown = fit('--method', 'guess', '--data', data);
      expect(unknown.status).not.toBe(0);
      expect(unknown.stderr).toContain('--method must be one of ols');
    },
    SPAWN_TIMEOUT,
  );
});
