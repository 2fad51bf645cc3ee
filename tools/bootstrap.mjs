// Prepares a fresh machine before any npm package exists: Debian packages, then `npm ci` when the
// lockfile changed since the last install. Plain Node on purpose — it runs before node_modules.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

const root = new URL('..', import.meta.url).pathname;

/** Debian packages each command needs, keyed by a file that proves the package is there. */
const debianPackages = {
  postgresql: '/usr/lib/postgresql/15/bin/postgres',
  chromium: '/usr/bin/chromium',
};

function log(message) {
  process.stdout.write(`[fieldcurve] ${message}\n`);
}

function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: 'inherit', cwd: root, ...options });
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} failed with exit code ${result.status}`);
  }
}

export function ensureDebianPackages(names) {
  const missing = names.filter((name) => !existsSync(debianPackages[name]));
  if (missing.length === 0) return;
  if (process.getuid?.() !== 0) {
    throw new Error(`Missing Debian packages: ${missing.join(', ')}. Install them with apt-get.`);
  }
  log(`installing Debian packages: ${missing.join(', ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  run('apt-get', ['update', '-qq'], { env });
  run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...missing], { env });
}

export function ensureNodeModules() {
  const lockfile = join(root, 'package-lock.json');
  const stamp = join(root, 'node_modules', '.fieldcurve-lock-sha256');
  const digest = createHash('sha256').update(readFileSync(lockfile)).digest('hex');
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === digest) return;
  log('installing npm packages (npm ci)');
  run('npm', ['ci', '--no-audit', '--no-fund']);
  writeFileSync(stamp, digest);
}

/** Runs a TypeScript entry point of the tools folder through tsx, passing signals through. */
export function runTypeScript(entry, args = []) {
  const tsx = join(root, 'node_modules', '.bin', 'tsx');
  const child = spawnSync(tsx, [join(root, entry), ...args], { stdio: 'inherit', cwd: root });
  return child.status ?? 1;
}

export function nodeVersionOk() {
  const [major, minor] = process.versions.node.split('.').map(Number);
  return major > 20 || (major === 20 && minor >= 19);
}

export function prepare(packages) {
  if (!nodeVersionOk()) throw new Error(`Node 20.19 or newer is needed; this is ${process.version}`);
  ensureDebianPackages(packages);
  ensureNodeModules();
  execFileSync('node', ['--version']);
}
