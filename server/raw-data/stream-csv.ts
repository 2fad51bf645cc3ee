import type { Writable } from 'node:stream';
import type { RawCell } from '@shared/raw-data/answer-parts';
import { neutraliseFormula } from '@shared/raw-data/spreadsheet-text';
import { writeOrWait } from './write-or-wait';

/** A CSV field (RFC 4180 quoting), text neutralised against formulas. */
function csvField(value: RawCell): string {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  const text = neutraliseFormula(value);
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Writes the header and each row as they come, waiting whenever the receiver falls behind. */
export async function streamCsv(
  out: Writable,
  header: readonly string[],
  rows: AsyncIterable<RawCell[]>,
): Promise<number> {
  await writeOrWait(out, `${header.map(csvField).join(',')}\r\n`);
  let count = 0;
  for await (const row of rows) {
    await writeOrWait(out, `${row.map(csvField).join(',')}\r\n`);
    count++;
  }
  out.end();
  return count;
}
