import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { checkoutRoot } from './state-dir';

const inputs = [
  'src',
  'shared',
  'public',
  'angular.json',
  'ngsw-config.json',
  'package-lock.json',
  'tsconfig.json',
  'tsconfig.app.json',
];
export const builtAppDir = join(checkoutRoot, 'dist', 'fieldcurve', 'browser');
const stampFile = join(checkoutRoot, 'dist', '.fieldcurve-build-stamp');

function fingerprint(): string {
  const hash = createHash('sha256');
  const visit = (path: string) => {
    const info = statSync(path);
    if (info.isDirectory()) {
      for (const entry of readdirSync(path).sort()) visit(join(path, entry));
    } else {
      hash.update(`${relative(checkoutRoot, path)}:${info.size}:${info.mtimeMs}\n`);
    }
  };
  for (const input of inputs) {
    const path = join(checkoutRoot, input);
    if (existsSync(path)) visit(path);
  }
  return hash.digest('hex');
}

/** Builds the production app unless the sources are unchanged since the last build. */
export function buildAppIfStale(log: (line: string) => void): void {
  const current = fingerprint();
  if (
    existsSync(stampFile) &&
    existsSync(join(builtAppDir, 'index.html')) &&
    readFileSync(stampFile, 'utf8') === current
  ) {
    log('app build is up to date');
    return;
  }
  log('building the app (production)…');
  const result = spawnSync(
    join(checkoutRoot, 'node_modules', '.bin', 'ng'),
    ['build', '--configuration', 'production'],
    {
      cwd: checkoutRoot,
      stdio: 'inherit',
      env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
    },
  );
  if (result.status !== 0) throw new Error('the app build failed (see the output above)');
  writeFileSync(stampFile, current);
}
