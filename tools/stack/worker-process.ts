import { spawn, type ChildProcess } from 'node:child_process';
import { createInterface } from 'node:readline';
import { serverCommand } from './server-build';
import { checkoutRoot } from './state-dir';

export interface WorkerProcess {
  child: ChildProcess;
  stop(): Promise<void>;
}

/**
 * Runs the fit worker (`server/worker.ts`, compiled) as its own process (as production runs workers, apart from the web
 * server) and waits until it has joined the fit queue.
 */
export async function startWorkerProcess(
  env: Record<string, string>,
  quiet = false,
): Promise<WorkerProcess> {
  const [command, args] = await serverCommand('worker');
  const child = spawn(command, args, {
    cwd: checkoutRoot,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  await new Promise<void>((ready, failed) => {
    const timer = setTimeout(
      () => failed(new Error('the fit worker did not start within 60 s')),
      60_000,
    );
    child.once('exit', (code) => failed(new Error(`the fit worker exited with code ${code}`)));
    createInterface({ input: child.stdout }).on('line', (line) => {
      if (!quiet) console.log(line);
      if (line.startsWith('[fieldcurve-worker] ready')) {
        clearTimeout(timer);
        ready();
      }
    });
  });
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
