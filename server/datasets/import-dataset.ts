import { eq, sql } from 'drizzle-orm';
import { from as copyFrom } from 'pg-copy-streams';
import {
  checkDatasetRow,
  planColumns,
  type PlannedColumn,
  type StoredValue,
} from '@shared/datasets/check-dataset-row';
import type { ColumnMapping } from '@shared/datasets/dataset-columns';
import type { ImportProblem } from '@shared/datasets/dataset-resource';
import type { DatasetFormat } from '@shared/datasets/dataset-upload';
import type { PoolClient } from 'pg';
import type { Database } from '../db/database';
import { datasets, datasetUploads } from '../db/schema';
import { datasetSchema, datasetTableName } from './dataset-table-name';
import { fileRecords, FileStructureError } from './file-records';
import { uploadBytes } from './upload-repository';

/** An import stops reading after this many problems: enough to fix a file in one go. */
const maxProblems = 20;
/** The server's count of bytes read is written this often (the progress bar). */
const progressEveryBytes = 4 * 1024 ** 2;

const sqlTypes = { number: 'float8', text: 'text', date: 'date' } as const;

/**
 * Imports a dataset's upload into its typed table: streams the stored chunks through the CSV or
 * XLSX reader, checks every row, and COPYs the rows in within one transaction. Any problem
 * rolls the whole import back (no table, no row) and is stored with its line and column; on
 * success the upload's chunks are deleted in the same transaction.
 */
export async function importDataset(db: Database, datasetId: string): Promise<void> {
  const [dataset] = await db.select().from(datasets).where(eq(datasets.id, datasetId));
  if (!dataset || dataset.status !== 'importing' || !dataset.uploadId) return;
  const [upload] = await db
    .select()
    .from(datasetUploads)
    .where(eq(datasetUploads.id, dataset.uploadId));
  if (!upload)
    return fail(db, datasetId, [wholeFile('the uploaded file has expired; upload it again')]);
  const columns = dataset.columns as ColumnMapping[];
  const client = await db.$client.connect();
  let bytesRead = 0;
  let reported = 0;
  const counted = (async function* () {
    for await (const chunk of uploadBytes(db, upload.id)) {
      bytesRead += chunk.length;
      if (bytesRead - reported >= progressEveryBytes) {
        reported = bytesRead;
        await db.update(datasets).set({ bytesRead }).where(eq(datasets.id, datasetId));
      }
      yield chunk;
    }
  })();
  try {
    await client.query('BEGIN');
    const outcome = await copyRows(
      client,
      datasetId,
      upload.format as DatasetFormat,
      columns,
      counted,
    );
    if ('problems' in outcome) {
      await client.query('ROLLBACK');
      return fail(db, datasetId, outcome.problems);
    }
    await client.query(
      `UPDATE datasets SET status = 'imported', row_count = $2, bytes_read = $3,
         imported_at = now(), upload_id = NULL WHERE id = $1`,
      [datasetId, outcome.rows, bytesRead],
    );
    await client.query('DELETE FROM dataset_uploads WHERE id = $1', [upload.id]);
    await client.query('COMMIT');
    await client.query(`ANALYZE ${datasetSchema}.${datasetTableName(datasetId)}`);
  } catch (error) {
    await client.query('ROLLBACK').catch(() => undefined);
    if (error instanceof FileStructureError) {
      return fail(db, datasetId, [{ line: error.line, column: null, message: error.message }]);
    }
    throw error;
  } finally {
    client.release();
  }
}

type Client = PoolClient;

async function copyRows(
  client: Client,
  datasetId: string,
  format: DatasetFormat,
  columns: readonly ColumnMapping[],
  bytes: AsyncIterable<Buffer>,
): Promise<{ rows: number } | { problems: ImportProblem[] }> {
  const records = fileRecords(format, bytes);
  const first = await records.next();
  if (first.done) return { problems: [wholeFile('the file is empty')] };
  const planned = planColumns(first.value.values, columns);
  if ('problems' in planned) return planned;
  const plan: PlannedColumn[] = planned.plan;
  const table = `${datasetSchema}.${datasetTableName(datasetId)}`;
  const definitions = plan.map(({ mapping }) => `"${mapping.name}" ${sqlTypes[mapping.type]}`);
  await client.query(`CREATE TABLE ${table} (line integer NOT NULL, ${definitions.join(', ')})`);
  const names = ['line', ...plan.map(({ mapping }) => `"${mapping.name}"`)].join(', ');
  const copy = client.query(copyFrom(`COPY ${table} (${names}) FROM STDIN (FORMAT csv)`));
  const finished = new Promise<void>((done, failed) => {
    copy.on('finish', done);
    copy.on('error', failed);
  });
  const problems: ImportProblem[] = [];
  let rows = 0;
  let batch: string[] = [];
  const flush = async () => {
    if (batch.length === 0) return;
    const text = batch.join('');
    batch = [];
    if (!copy.write(text)) await new Promise((drained) => copy.once('drain', drained));
  };
  for await (const record of records) {
    const checked = checkDatasetRow(record.values, record.line, plan);
    if ('problems' in checked) {
      problems.push(...checked.problems);
      if (problems.length >= maxProblems) break;
      continue;
    }
    if (problems.length > 0) continue;
    rows++;
    batch.push(csvLine(record.line, checked.values));
    if (batch.length >= 2000) await flush();
  }
  await flush();
  copy.end();
  await finished;
  if (problems.length > 0) return { problems: problems.slice(0, maxProblems) };
  if (rows === 0) {
    return { problems: [wholeFile('the file has a header row but no data rows')] };
  }
  return { rows };
}

function csvLine(line: number, values: readonly StoredValue[]): string {
  let text = String(line);
  for (const value of values) {
    text += ',';
    if (value === null) continue;
    text += typeof value === 'number' ? String(value) : `"${value.replaceAll('"', '""')}"`;
  }
  return `${text}\n`;
}

function wholeFile(message: string): ImportProblem {
  return { line: null, column: null, message };
}

async function fail(db: Database, datasetId: string, problems: ImportProblem[]): Promise<void> {
  await db
    .update(datasets)
    .set({ status: 'failed', problems, bytesRead: sql`${datasets.bytesRead}` })
    .where(eq(datasets.id, datasetId));
}
