// `npm start`: set up whatever is missing, then run the local stack and serve the app.
import { prepare, runTypeScript } from './bootstrap.mjs';

// Ctrl-C reaches the whole process group; the stack below cleans up, this wrapper just waits.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => {});

try {
  prepare(['postgresql']);
} catch (error) {
  process.stderr.write(`[fieldcurve] set-up failed: ${error.message}\n`);
  process.exit(1);
}
process.exit(runTypeScript('tools/stack/serve.ts', process.argv.slice(2)));
