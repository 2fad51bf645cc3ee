// `npm run bench`: set up whatever is missing, then measure on a private database cluster.
import { prepare, runTypeScript } from './bootstrap.mjs';

try {
  prepare(['postgresql']);
} catch (error) {
  process.stderr.write(`[fieldcurve] set-up failed: ${error.message}\n`);
  process.exit(1);
}
process.exit(runTypeScript('tools/bench/run-bench.ts', process.argv.slice(2)));
