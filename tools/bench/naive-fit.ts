import pg from 'pg';
import { fitLinearModel } from '@shared/estimation/least-squares/fit-linear-model';

/**
 * The naive path, run in a child process of its own so its peak memory is its own: pull every
 * row into Node with pg, then fit with fitLinearModel. Arguments: database URL, table, response
 * column, regressor columns. Prints one JSON line with the times, the peak RSS and the fit.
 */
async function main(): Promise<void> {
  const [url, table, response, ...regressors] = process.argv.slice(2);
  const columns = [response, ...regressors];
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  const started = performance.now();
  const quoted = columns.map((c) => client.escapeIdentifier(c)).join(', ');
  const result = await client.query<number[]>({
    text: `SELECT ${quoted} FROM ${client.escapeIdentifier(table)}`,
    rowMode: 'array',
  });
  const pulled = performance.now();
  const values = columns.map((_, j) => result.rows.map((row) => row[j]));
  const fit = fitLinearModel({
    response: { name: response, values: values[0] },
    regressors: regressors.map((name, j) => ({ name, values: values[j + 1] })),
    standardErrors: { type: 'classical' },
  });
  const finished = performance.now();
  await client.end();
  console.log(
    JSON.stringify({
      seconds: (finished - started) / 1000,
      pullSeconds: (pulled - started) / 1000,
      peakRssMegabytes: process.resourceUsage().maxRSS / 1024,
      coefficients: fit.coefficients.map((c) => [c.estimate, c.stdError]),
    }),
  );
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : String(error));
  process.exit(1);
});
