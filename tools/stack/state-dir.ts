import { createHash } from 'node:crypto';
import { chmodSync, mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';

const checkoutRoot = resolve(import.meta.dirname, '..', '..');

/**
 * Where a checkout keeps its local database, objects and mail. It lives under /var/tmp, not in
 * the checkout, because PostgreSQL runs as `postgres` and must traverse every parent folder; the
 * checkout's path is hashed in so two clones on one machine never share state. Each purpose
 * (development, tests, benchmarks) has its own folder and so its own database cluster.
 */
export function stateDir(purpose: 'dev' | 'test' | 'bench'): string {
  const key = createHash('sha256').update(checkoutRoot).digest('hex').slice(0, 10);
  const dir = join('/var/tmp', `fieldcurve-${key}`, purpose);
  mkdirSync(dir, { recursive: true });
  chmodSync(join(dir, '..'), 0o755);
  chmodSync(dir, 0o755);
  return dir;
}

export { checkoutRoot };
