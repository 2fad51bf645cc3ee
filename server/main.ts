import cluster from 'node:cluster';
import { createApp } from './app';
import { loadConfig } from './config';
import { createDependencies } from './create-dependencies';
import { connectDatabase } from './db/database';
import { applyMigrations } from './db/migrate';
import { runWebProcesses } from './web-processes';

const config = loadConfig();

if (cluster.isPrimary && config.WEB_PROCESSES > 1) {
  // Migrate once, before any copy of the server serves a request.
  const db = connectDatabase(config.DATABASE_URL, 1);
  await applyMigrations(db);
  await db.$client.end();
  runWebProcesses(config.WEB_PROCESSES);
} else {
  await serve();
}

async function serve() {
  const deps = createDependencies(config);
  if (cluster.isPrimary) await applyMigrations(deps.db);
  const server = createApp(deps).listen(config.PORT, config.HOST, () => {
    if (cluster.isPrimary || cluster.worker?.id === 1) {
      console.log(`[fieldcurve] serving ${config.APP_URL}`);
    }
  });

  // Finish requests in flight, then release the database, so a stop never cuts a sync batch.
  // A web process of a cluster may hear a stop twice (from the terminal and from its primary).
  let stopping = false;
  function shutDown(signal: string) {
    if (stopping) return;
    stopping = true;
    if (cluster.isPrimary) console.log(`[fieldcurve] ${signal}: shutting down`);
    server.close(() => {
      void deps.db.$client.end().then(() => process.exit(0));
    });
    setTimeout(() => process.exit(1), 10_000).unref();
  }
  process.on('SIGTERM', () => shutDown('SIGTERM'));
  process.on('SIGINT', () => shutDown('SIGINT'));
}
