import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { buildAppIfStale, builtAppDir } from './app-build';
import { freePort } from './free-port';
import { startLocalStack } from './local-stack';
import { prepareDatabase } from './prepare-database';
import { startServerProcess } from './server-process';
import { startWorkerProcess } from './worker-process';
import { checkoutRoot, stateDir } from './state-dir';
import { clientUnitStep, jestStep, wholeStep, type StepResult } from './test-steps';

const log = (line: string) => console.log(`[fieldcurve] ${line}`);

/**
 * `npm test`: the local stack on free ports with its own database, then lint, type-check, unit,
 * API, client and browser tests. Arguments, when given, go to jest alone (to run one test file).
 */
async function main(): Promise<number> {
  const only = process.argv.slice(2);
  mkdirSync(join(checkoutRoot, 'test-results'), { recursive: true });
  const ports = {
    app: await freePort(),
    postgres: await freePort(),
    identityProvider: await freePort(),
    objectStore: await freePort(),
    smtp: await freePort(),
    mailInbox: await freePort(),
  };
  // Each run gets its own cluster and stand-in state, so two runs on one checkout never collide;
  // a cold cluster starts in about two seconds.
  const runDir = join(stateDir('test'), `run-${process.pid}`);
  mkdirSync(runDir, { recursive: true });
  const stack = await startLocalStack(runDir, ports, 'fieldcurve_test', true, true);
  const results: StepResult[] = [];
  let stopServer = async () => {};
  try {
    await prepareDatabase(stack.env['DATABASE_URL']);
    buildAppIfStale(log);
    const server = await startServerProcess({ ...stack.env, STATIC_DIR: builtAppDir }, true);
    // Fits run in a worker process of their own, as in production.
    const worker = await startWorkerProcess(stack.env, true);
    stopServer = () => Promise.all([worker.stop(), server.stop()]).then(() => undefined);
    const env = { ...stack.env, TEST_APP_URL: stack.env['APP_URL'], STATE_DIR: runDir };
    if (only.length > 0) {
      results.push(await jestStep('selected tests', only, env));
    } else {
      results.push(
        await wholeStep('lint', join(checkoutRoot, 'node_modules', '.bin', 'eslint'), [
          '.',
          '--max-warnings=0',
        ]),
      );
      results.push(await wholeStep('type-check', 'npm', ['run', '--silent', 'typecheck']));
      results.push(
        await jestStep('server and shared unit tests', ['--selectProjects', 'unit'], env),
      );
      results.push(await jestStep('API tests', ['--selectProjects', 'api'], env));
      results.push(await clientUnitStep());
      results.push(
        await jestStep('browser tests', ['--selectProjects', 'e2e', '--runInBand'], env),
      );
    }
  } finally {
    await stopServer();
    await stack.stop();
    rmSync(runDir, { recursive: true, force: true });
  }
  console.log('\n[fieldcurve] summary');
  for (const r of results)
    console.log(`  ${r.name.padEnd(30)} ${r.passed} passed, ${r.failed} failed`);
  const passed = results.reduce((sum, r) => sum + r.passed, 0);
  const failed = results.reduce((sum, r) => sum + r.failed, 0);
  console.log(`${passed} passed, ${failed} failed`);
  return failed === 0 && passed > 0 ? 0 : 1;
}

main()
  .then((code) => process.exit(code))
  .catch((error: unknown) => {
    console.error(`[fieldcurve] ${error instanceof Error ? error.message : String(error)}`);
    console.log('0 passed, 1 failed');
    process.exit(1);
  });
