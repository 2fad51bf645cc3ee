import cluster, { type Worker } from 'node:cluster';

/**
 * Runs `count` copies of the web server sharing one port, as the primary process of a Node
 * cluster: one JavaScript thread per core, so requests that check and store large sync
 * batches do not queue behind one another on a single thread. The copies share nothing but
 * the database (sessions included), so any of them may answer any request.
 *
 * A copy that dies unexpectedly after it began serving is replaced; one that dies before (the
 * port taken, say) would only die again, so the whole server stops with an error. SIGTERM or SIGINT is passed on to every copy,
 * which finishes its requests in flight; the primary exits when the last one has. A copy
 * whose primary is killed exits at once (Node closes the channel between them).
 */
export function runWebProcesses(count: number): void {
  let stopping = false;
  let failed = false;
  const serving = new WeakSet<Worker>();
  const fork = () => cluster.fork();
  cluster.on('listening', (worker: Worker) => serving.add(worker));
  cluster.on('exit', (worker: Worker, code, signal) => {
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(failed ? 1 : 0);
      return;
    }
    if (!serving.has(worker)) {
      console.error(`[fieldcurve] a web process ended (${signal ?? code}) before it could serve`);
      failed = true;
      stop('SIGTERM');
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(1);
      return;
    }
    console.error(
      `[fieldcurve] web process ${worker.process.pid} ended (${signal ?? code}); starting another`,
    );
    fork();
  });
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    console.log(`[fieldcurve] ${signal}: stopping ${count} web processes`);
    for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill(signal);
    setTimeout(() => process.exit(1), 12_000).unref();
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
  for (let i = 0; i < count; i += 1) fork();
}
