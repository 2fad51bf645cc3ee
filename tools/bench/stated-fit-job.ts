// One fit job in a fresh process, as a worker runs it: claims the queued fit, reads its data,
// estimates and stores the result; prints the job's time and the process's peak resident memory.
import { connectDatabase } from '../../server/db/database';
import { runFitJob } from '../../server/fits/run-fit-job';

const [url, fitId] = process.argv.slice(2);
const db = connectDatabase(url, 2);
const started = performance.now();
try {
  await runFitJob(db, fitId, 'bench');
  console.log(`job-seconds ${(performance.now() - started) / 1000}`);
} finally {
  await db.$client.end();
}
// maxRSS is in kilobytes.
console.log(`peak-rss-mb ${process.resourceUsage().maxRSS / 1024}`);
