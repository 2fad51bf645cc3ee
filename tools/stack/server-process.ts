import { spawn, type ChildProcess } from 'node:child_process';
import { serverCommand } from './server-build';
import { checkoutRoot } from './state-dir';

export interface ServerProcess {
  child: ChildProcess;
  stop(): Promise<void>;
}

async function waitForHealth(url: string, child: ChildProcess): Promise<void> {
  for (let attempt = 0; attempt < 300; attempt += 1) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.status === 200 || response.status === 503) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the server did not answer /api/health within 30 s');
}

/**
 * Runs the web server (`server/main.ts`, compiled) as its own process, the way production runs
 * it, with the stack's config.
 */
export async function startServerProcess(
  env: Record<string, string>,
  quiet = false,
): Promise<ServerProcess> {
  const [command, args] = await serverCommand('main');
  const child = spawn(command, args, {
    cwd: checkoutRoot,
    env: { ...process.env, ...env },
    stdio: quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
  });
  await waitForHealth(env['APP_URL'], child);
  return {
    child,
    stop: () =>
      new Promise((done) => {
        if (child.exitCode !== null) return done();
        child.once('exit', () => done());
        child.kill('SIGTERM');
      }),
  };
}
