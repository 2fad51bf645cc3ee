// `npm test`: the same set-up as `npm start`, then every check against a separate test database.
import { prepare, runTypeScript } from './bootstrap.mjs';

try {
  prepare(['postgresql', 'chromium']);
} catch (error) {
  process.stderr.write(`[fieldcurve] set-up failed: ${error.message}\n`);
  process.stdout.write('0 passed, 1 failed\n');
  process.exit(1);
}
process.exit(runTypeScript('tools/stack/test-run.ts', process.argv.slice(2)));
