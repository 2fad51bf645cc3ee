import { createApp } from './app';
import { loadConfig } from './config';
import { createDependencies } from './create-dependencies';
import { applyMigrations } from './db/migrate';

const config = loadConfig();
const deps = createDependencies(config);
await applyMigrations(deps.db);
const server = createApp(deps).listen(config.PORT, config.HOST, () => {
  console.log(`[fieldcurve] serving ${config.APP_URL}`);
});

// Finish requests in flight, then release the database, so a stop never cuts a sync batch.
function shutDown(signal: string) {
  console.log(`[fieldcurve] ${signal}: shutting down`);
  server.close(() => {
    void deps.db.$client.end().then(() => process.exit(0));
  });
  setTimeout(() => process.exit(1), 10_000).unref();
}
process.on('SIGTERM', () => shutDown('SIGTERM'));
process.on('SIGINT', () => shutDown('SIGINT'));
