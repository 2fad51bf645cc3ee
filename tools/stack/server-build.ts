import { join } from 'node:path';
import { build } from 'esbuild';
import { checkoutRoot } from './state-dir';

/** The server's entry points: the web server and the fit worker. */
export type ServerEntry = 'main' | 'worker';

/**
 * Where the compiled entry points go. Two folders below the root, as `server/db` is, so a path
 * a module builds from its own folder (the migrations folder) holds in the bundle too.
 */
const outDir = join(checkoutRoot, 'dist', 'server');

let built: Promise<void> | undefined;

/**
 * Compiles the server's entry points to plain JavaScript, once per process, and answers the
 * file to run for `entry`. Production runs compiled code rather than a TypeScript loader: the
 * loader keeps every function's name by wrapping each arrow function it creates, which cost
 * the sync path about a fifth of its throughput. Packages stay outside the bundle and load from
 * node_modules; only our own code (server and shared) is bundled, with source maps so stack
 * traces point at the TypeScript. It takes well under a second.
 */
export async function builtServerEntry(entry: ServerEntry): Promise<string> {
  built ??= build({
    entryPoints: {
      main: join(checkoutRoot, 'server', 'main.ts'),
      worker: join(checkoutRoot, 'server', 'worker.ts'),
    },
    outdir: outDir,
    outExtension: { '.js': '.mjs' },
    bundle: true,
    packages: 'external',
    platform: 'node',
    format: 'esm',
    target: 'node20',
    tsconfig: join(checkoutRoot, 'tsconfig.server.json'),
    sourcemap: true,
    logLevel: 'warning',
  }).then(() => undefined);
  await built;
  return join(outDir, `${entry}.mjs`);
}

/** The arguments that run a compiled entry point with Node. */
export async function serverCommand(entry: ServerEntry): Promise<[string, string[]]> {
  return [process.execPath, ['--enable-source-maps', await builtServerEntry(entry)]];
}
