import { spawn } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { checkoutRoot } from './state-dir';

export interface StepResult {
  name: string;
  passed: number;
  failed: number;
}

const bin = (name: string) => join(checkoutRoot, 'node_modules', '.bin', name);

/**
 * Runs one step as a child process without blocking this process: the stand-ins (identity
 * provider, mail sink, object store) live in this process and must keep answering meanwhile.
 */
function run(
  command: string,
  args: string[],
  env: Record<string, string>,
): Promise<{ status: number | null }> {
  return new Promise((resolveRun, reject) => {
    const child = spawn(command, args, {
      cwd: checkoutRoot,
      stdio: 'inherit',
      env: { ...process.env, ...env },
    });
    child.once('error', reject);
    child.once('close', (status) => resolveRun({ status }));
  });
}

/** A check that either passes or fails as a whole (lint, type-check). */
export async function wholeStep(
  name: string,
  command: string,
  args: string[],
  env: Record<string, string> = {},
): Promise<StepResult> {
  console.log(`\n[fieldcurve] ${name}`);
  const ok = (await run(command, args, env)).status === 0;
  return { name, passed: ok ? 1 : 0, failed: ok ? 0 : 1 };
}

/** Jest, counting individual tests from its JSON report. */
export async function jestStep(
  name: string,
  args: string[],
  env: Record<string, string>,
): Promise<StepResult> {
  console.log(`\n[fieldcurve] ${name}`);
  const report = join(checkoutRoot, 'test-results', `${name.replace(/\W+/g, '-')}.json`);
  rmSync(report, { force: true });
  const result = await run(
    process.execPath,
    [
      '--experimental-vm-modules',
      join(checkoutRoot, 'node_modules', 'jest', 'bin', 'jest.js'),
      '--json',
      '--passWithNoTests',
      `--outputFile=${report}`,
      ...args,
    ],
    env,
  );
  if (!existsSync(report)) return { name, passed: 0, failed: 1 };
  const summary = JSON.parse(readFileSync(report, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numRuntimeErrorTestSuites: number;
  };
  const crashed =
    summary.numRuntimeErrorTestSuites +
    (result.status !== 0 && summary.numFailedTests === 0 ? 1 : 0);
  return { name, passed: summary.numPassedTests, failed: summary.numFailedTests + crashed };
}

/** The Angular unit tests (Vitest through the CLI), counted from Vitest's JSON report. */
export async function clientUnitStep(): Promise<StepResult> {
  const name = 'client unit tests';
  console.log(`\n[fieldcurve] ${name}`);
  const report = join(checkoutRoot, 'test-results', 'client-unit.json');
  rmSync(report, { force: true });
  const result = await run(
    bin('ng'),
    ['test', '--watch=false', '--reporters=default', '--reporters=json', `--output-file=${report}`],
    { NG_CLI_ANALYTICS: 'false' },
  );
  if (!existsSync(report)) return { name, passed: 0, failed: 1 };
  const summary = JSON.parse(readFileSync(report, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
  };
  const crashed = result.status !== 0 && summary.numFailedTests === 0 ? 1 : 0;
  return { name, passed: summary.numPassedTests, failed: summary.numFailedTests + crashed };
}
