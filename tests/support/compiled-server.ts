import { spawn, type ChildProcess } from 'node:child_process';
import { freePort } from '../../tools/stack/free-port';
import { serverCommand } from '../../tools/stack/server-build';
import { checkoutRoot } from '../../tools/stack/state-dir';

export interface RunningServer {
  url: string;
  child: ChildProcess;
}

/**
 * The compiled server as a process of its own (no wrapper, so a signal sent to `child` reaches
 * it) on a free port, with the test stack's environment plus `env`; answers once it serves
 * /api/health. A given `port` restarts a server where it was, so its clients find it again.
 */
export async function startCompiledServer(
  env: Record<string, string> = {},
  port?: number,
): Promise<RunningServer> {
  port ??= await freePort();
  const url = `http://127.0.0.1:${port}`;
  const [command, args] = await serverCommand('main');
  const child = spawn(command, args, {
    cwd: checkoutRoot,
    env: {
      ...process.env,
      HOST: '127.0.0.1',
      PORT: String(port),
      APP_URL: url,
      STATIC_DIR: '',
      ...env,
    },
    stdio: ['ignore', 'ignore', 'ignore'],
  });
  for (let attempt = 0; attempt < 600; attempt += 1) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`);
    const health = await fetch(`${url}/api/health`).catch(() => undefined);
    if (health) return { url, child };
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('the server did not answer within 30 s');
}

/** SIGKILL, and wait until the process has gone. */
export function killHard(server: RunningServer): Promise<void> {
  return new Promise((done) => {
    if (server.child.exitCode !== null || server.child.signalCode !== null) return done();
    server.child.once('exit', () => done());
    server.child.kill('SIGKILL');
  });
}
