import { spawn, type ChildProcess } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { freePort } from '../../tools/stack/free-port';
import { serverCommand } from '../../tools/stack/server-build';
import { checkoutRoot } from '../../tools/stack/state-dir';
import { startCompiledServer, type RunningServer } from '../support/compiled-server';

/** The compiled server with two web processes, as two cores would run it. */
async function startServer(): Promise<RunningServer> {
  const server = await startCompiledServer({ WEB_PROCESSES: '2' });
  await until(() => webProcesses(server.child.pid!).length === 2, 'two web processes');
  return server;
}

/** Pids of the processes whose parent is `parent` (from /proc: Linux). */
function webProcesses(parent: number): number[] {
  return readdirSync('/proc')
    .filter((entry) => /^\d+$/.test(entry))
    .filter((pid) => {
      try {
        const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
        return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]) === parent;
      } catch {
        return false; // ended meanwhile
      }
    })
    .map(Number);
}

/** Running, that is: neither gone nor a zombie waiting to be reaped. */
const alive = (pid: number) => {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2).split(' ')[0] !== 'Z';
  } catch {
    return false;
  }
};

async function until(check: () => Promise<boolean> | boolean, what: string): Promise<void> {
  for (let waited = 0; waited < 20_000; waited += 50) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`gave up waiting for ${what}`);
}

const exited = (child: ChildProcess) =>
  new Promise<number | null>((done) => {
    if (child.exitCode !== null) return done(child.exitCode);
    child.once('exit', (code) => done(code));
  });

describe('web processes sharing the port', () => {
  it('replaces a web process that dies, and keeps answering', async () => {
    const server = await startServer();
    try {
      const [victim] = webProcesses(server.child.pid!);
      process.kill(victim, 'SIGKILL');
      await until(() => {
        const now = webProcesses(server.child.pid!);
        return now.length === 2 && !now.includes(victim);
      }, 'a replacement web process');
      for (let i = 0; i < 6; i += 1) {
        expect((await fetch(`${server.url}/api/health`)).status).toBe(200);
      }
    } finally {
      server.child.kill('SIGKILL');
      await exited(server.child);
    }
  });

  it('stops every web process, cleanly, on SIGTERM', async () => {
    const server = await startServer();
    const copies = webProcesses(server.child.pid!);
    server.child.kill('SIGTERM');
    expect(await exited(server.child)).toBe(0);
    await until(() => copies.every((pid) => !alive(pid)), 'the web processes to end');
  });

  it('leaves no web process behind when the primary is killed outright', async () => {
    const server = await startServer();
    const copies = webProcesses(server.child.pid!);
    server.child.kill('SIGKILL');
    await exited(server.child);
    await until(() => copies.every((pid) => !alive(pid)), 'orphaned web processes to end');
    await expect(fetch(`${server.url}/api/health`)).rejects.toThrow();
  });

  it('stops with an error, instead of starting copies again and again, when none can serve', async () => {
    // The built app is missing, so every copy fails as it starts.
    const emptyBuild = mkdtempSync(join(tmpdir(), 'fieldcurve-no-build-'));
    try {
      const port = await freePort();
      const [command, args] = await serverCommand('main');
      const child = spawn(command, args, {
        cwd: checkoutRoot,
        env: {
          ...process.env,
          HOST: '127.0.0.1',
          PORT: String(port),
          APP_URL: `http://127.0.0.1:${port}`,
          STATIC_DIR: emptyBuild,
          WEB_PROCESSES: '2',
        },
        stdio: ['ignore', 'ignore', 'ignore'],
      });
      expect(await exited(child)).toBe(1);
      await until(() => webProcesses(child.pid!).length === 0, 'no web process left');
    } finally {
      rmSync(emptyBuild, { recursive: true, force: true });
    }
  });
});
