import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import { sqlStateOf } from './database-refusal';
import type { InterviewInsert, PhotoInsert } from './interview-row';

/** The columns COPY fills, in the order each line lists them. */
const columns: readonly (keyof InterviewInsert)[] = [
  'id',
  'studyId',
  'questionnaireVersionId',
  'routeId',
  'pointId',
  'enumeratorId',
  'status',
  'answers',
  'flags',
  'startedAt',
  'finishedAt',
  'receivedAt',
  'latitude',
  'longitude',
  'gpsAccuracyM',
  'respondentKey',
  'photoCount',
  'completeAt',
];
const snakeCase = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const copyStatement = `COPY interviews (${columns.map(snakeCase).join(', ')}) FROM STDIN`;

const escapable = /[\\\t\n\r]/;
const escapeSequence: Record<string, string> = {
  '\\': '\\\\',
  '\t': '\\t',
  '\n': '\\n',
  '\r': '\\r',
};

/** Text as COPY reads it: backslash, tab and line breaks escaped (most values have none). */
function copyText(text: string): string {
  return escapable.test(text) ? text.replace(/[\\\t\n\r]/g, (c) => escapeSequence[c]) : text;
}

/** One field in COPY's text format: \N for NULL. */
function copyField(value: unknown): string {
  if (value === null || value === undefined) return '\\N';
  if (typeof value === 'string') return copyText(value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (value instanceof Date) return value.toISOString();
  // JSON escapes control characters itself, so only its backslashes need doubling.
  const json = JSON.stringify(value);
  return json.includes('\\') ? json.replaceAll('\\', '\\\\') : json;
}

/** The rows as COPY text, one line per interview (built by concatenation: it is hot). */
export function interviewCopyText(rows: readonly InterviewInsert[]): string {
  let text = '';
  for (const row of rows) {
    let line = copyField(row[columns[0]]);
    for (let c = 1; c < columns.length; c += 1) line += '\t' + copyField(row[columns[c]]);
    text += line + '\n';
  }
  return text;
}

/**
 * Stores new interviews (and the photo rows they declare) with one `COPY`, the cheapest way
 * into PostgreSQL: parsing JSON parameters costs the database more than storing the rows. COPY
 * has no ON CONFLICT, so this is the optimistic path for ids nobody stored yet (the batch was
 * checked against the table just before): it answers null, having stored nothing, when
 * PostgreSQL refused the rows — an id turned out to be taken (a concurrent request got there
 * first), or a value it cannot store slipped past the checks — and the caller then takes the
 * INSERT … ON CONFLICT path that judges each id and each row. Photos go in the same transaction.
 */
export async function copyInterviewRows(
  pool: pg.Pool,
  rows: readonly InterviewInsert[],
  photos: readonly PhotoInsert[],
): Promise<string[] | null> {
  if (rows.length === 0) return [];
  const client = await pool.connect();
  // COPY alone is one atomic statement; photo rows need a transaction around both.
  const transaction = photos.length > 0;
  try {
    if (transaction) await client.query('BEGIN');
    await pipeline(Readable.from([interviewCopyText(rows)]), client.query(copyFrom(copyStatement)));
    if (transaction) {
      await client.query(
        `INSERT INTO interview_photos (id, interview_id, sha256, byte_size, content_type)
         SELECT p.id, p."interviewId", p.sha256, p."byteSize", p."contentType"
         FROM jsonb_to_recordset($1::jsonb) AS p(id uuid, "interviewId" uuid, sha256 text,
           "byteSize" int, "contentType" text)
         ON CONFLICT (id) DO NOTHING`,
        [JSON.stringify(photos)],
      );
      await client.query('COMMIT');
    }
    return rows.map((row) => row.id);
  } catch (error) {
    if (transaction) await client.query('ROLLBACK').catch(() => undefined);
    if (sqlStateOf(error) !== null) return null;
    throw error;
  } finally {
    client.release();
  }
}
