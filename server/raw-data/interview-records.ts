import type pg from 'pg';
import QueryStream from 'pg-query-stream';
import type { SQL } from 'drizzle-orm';
import type { InterviewRecord } from './raw-row';
import { compiled } from './raw-data-source';

/** Rows fetched from the cursor at a time: small enough to keep memory flat, big enough to be quick. */
const batchRows = 500;

/**
 * The rows of `query` through a database cursor, a batch at a time, so a million interviews
 * pass through without being held. Stopping early (the caller went away) closes the cursor and
 * drops the connection rather than hand a busy one back to the pool.
 */
export async function* interviewRecords(
  pool: pg.Pool,
  query: SQL,
): AsyncGenerator<InterviewRecord> {
  const client = await pool.connect();
  const { text, values } = compiled(query);
  const stream = client.query(
    new QueryStream(text, values, { batchSize: batchRows, highWaterMark: batchRows }),
  );
  let finished = false;
  try {
    for await (const row of stream) yield row as InterviewRecord;
    finished = true;
  } finally {
    if (!finished) stream.destroy();
    client.release(!finished);
  }
}
