import { buildAppIfStale, builtAppDir } from './app-build';
import { startLocalStack } from './local-stack';
import { prepareDatabase } from './prepare-database';
import { startServerProcess } from './server-process';
import { startWorkerProcess } from './worker-process';
import { stateDir } from './state-dir';
import { demoPassword, demoPeople } from '../../server/demo/demo-people';

const log = (line: string) => console.log(`[fieldcurve] ${line}`);
const port = (name: string, fallback: number) => Number(process.env[name] ?? fallback);

async function main() {
  const stack = await startLocalStack(
    stateDir('dev'),
    {
      app: port('FIELDCURVE_PORT', 4400),
      postgres: port('FIELDCURVE_PG_PORT', 5544),
      identityProvider: 4401,
      objectStore: 4402,
      mailInbox: 4403,
      smtp: 2525,
    },
    'fieldcurve',
  );
  let stopServer = async () => {};
  let stopping = false;
  // Ctrl-C reaches the server too, whose exit then asks for a stop again: stop once.
  const stopAll = async (code: number) => {
    if (stopping) return;
    stopping = true;
    log('stopping…');
    await stopServer();
    await stack.stop();
    process.exit(code);
  };
  process.on('SIGINT', () => void stopAll(0));
  process.on('SIGTERM', () => void stopAll(0));
  try {
    log('database: applying migrations and the demo scenario');
    await prepareDatabase(stack.env['DATABASE_URL']);
    buildAppIfStale(log);
    const server = await startServerProcess({ ...stack.env, STATIC_DIR: builtAppDir });
    // Fits run in a worker process of their own, as in production.
    const worker = await startWorkerProcess(stack.env);
    stopServer = () => Promise.all([worker.stop(), server.stop()]).then(() => undefined);
    server.child.once('exit', (code) => void stopAll(code ?? 1));
  } catch (error) {
    console.error(`[fieldcurve] ${error instanceof Error ? error.message : String(error)}`);
    await stopAll(1);
    return;
  }
  const accounts = demoPeople
    .map((p) => `    ${p.roles.join(', ').padEnd(11)} ${p.email}`)
    .join('\n');
  console.log(`
  Fieldcurve is running at ${stack.env['APP_URL']}

  Demo accounts (password: ${demoPassword}):
${accounts}

  Mail sent by the app: ${stack.mailInboxUrl}
  Press Ctrl-C to stop everything.
`);
}

main().catch((error: unknown) => {
  console.error(`[fieldcurve] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
