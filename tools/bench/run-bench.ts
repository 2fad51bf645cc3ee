import { freePort } from '../stack/free-port';
import { startPostgres } from '../stack/postgres-cluster';
import { stateDir } from '../stack/state-dir';
import type { BenchContext, BenchPart } from './bench-part';
import { exportBench } from './export-bench';
import { fitBench } from './fit-bench';
import { memoryFitBench } from './memory-fit-bench';
import { statedFitBench } from './stated-fit-bench';
import { syncBench } from './sync-bench';
import { syncLoadBench } from './sync-load-bench';
import { datasetBench } from './dataset-bench';

/** The parts `npm run bench` runs, in order; `npm run bench -- NAME…` runs only those. */
const parts: readonly BenchPart[] = [
  fitBench,
  memoryFitBench,
  syncBench,
  syncLoadBench,
  datasetBench,
  statedFitBench,
  exportBench,
];

const log = (line: string) => console.log(`[fieldcurve] ${line}`);

function formatValue(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toPrecision(4);
}

async function main(): Promise<number> {
  const wanted = process.argv.slice(2);
  const unknown = wanted.filter((name) => !parts.some((p) => p.name === name));
  if (unknown.length > 0) {
    log(`unknown part(s): ${unknown.join(', ')}; parts: ${parts.map((p) => p.name).join(', ')}`);
    return 1;
  }
  const port = await freePort();
  // A fresh database each run: a run that was interrupted may have left its tables behind.
  const cluster = await startPostgres({
    dir: stateDir('bench'),
    port,
    database: 'fieldcurve_bench',
    fresh: true,
  });
  const context: BenchContext = {
    databaseUrl: cluster.url,
    report: (name, value, unit) => console.log(`bench ${name} ${formatValue(value)} ${unit}`),
    log,
  };
  try {
    for (const part of parts.filter((p) => wanted.length === 0 || wanted.includes(p.name))) {
      log(`part ${part.name}`);
      await part.run(context);
    }
  } finally {
    cluster.stop();
  }
  return 0;
}

main()
  .then((code) => process.exit(code))
  .catch((error: unknown) => {
    console.error(`[fieldcurve] ${error instanceof Error ? error.stack : String(error)}`);
    process.exit(1);
  });
