import { Readable } from 'node:stream';
import { parse } from 'csv-parse';
import ExcelJS from 'exceljs';
import type { DatasetFormat } from '@shared/datasets/dataset-upload';

/** One record of the file with the line it starts on (1 = the header). */
export interface FileRecord {
  readonly line: number;
  readonly values: string[];
}

/** A problem of the file as a whole (its structure, not one value). */
export class FileStructureError extends Error {
  constructor(
    message: string,
    readonly line: number | null,
  ) {
    super(message);
  }
}

/**
 * Streams the records of a comma-separated CSV (csv-parse) or of
 * the first sheet of an XLSX workbook (exceljs's streaming reader), one at a time.
 */
export function fileRecords(
  format: DatasetFormat,
  bytes: AsyncIterable<Buffer>,
): AsyncGenerator<FileRecord> {
  return format === 'xlsx' ? workbookRecords(bytes) : csvRecords(bytes);
}

async function* csvRecords(bytes: AsyncIterable<Buffer>): AsyncGenerator<FileRecord> {
  const source = Readable.from(bytes, { objectMode: false });
  const parser = parse({
    bom: true,
    relax_column_count: true,
    skip_empty_lines: true,
    info: true,
    cast: false,
  });
  source.on('error', (error) => parser.destroy(error));
  source.pipe(parser);
  try {
    for await (const item of parser as AsyncIterable<{
      record: string[];
      info: { lines: number };
    }>) {
      yield { line: item.info.lines, values: item.record };
    }
  } catch (error) {
    const lines = (error as { lines?: number }).lines;
    const message = error instanceof Error ? error.message : String(error);
    throw new FileStructureError(
      `the file could not be read as CSV: ${message.replace(/^Invalid Record Length: /, '')}`,
      typeof lines === 'number' ? lines : null,
    );
  }
}

async function* workbookRecords(bytes: AsyncIterable<Buffer>): AsyncGenerator<FileRecord> {
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(Readable.from(bytes), {
    sharedStrings: 'cache',
    hyperlinks: 'ignore',
    styles: 'cache',
    worksheets: 'emit',
    entries: 'emit',
  });
  try {
    for await (const sheet of reader) {
      for await (const row of sheet as AsyncIterable<ExcelJS.Row>) {
        const cells = (row.values as unknown[]).slice(1).map(cellText);
        while (cells.length > 0 && cells[cells.length - 1] === '') cells.pop();
        if (cells.length > 0) yield { line: row.number, values: cells };
      }
      return; // the first sheet holds the data
    }
  } catch (error) {
    if (error instanceof FileStructureError) throw error;
    throw new FileStructureError('the file could not be read as an Excel workbook', null);
  }
}

function cellText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if (typeof value === 'object') {
    const cell = value as { result?: unknown; richText?: { text: string }[]; text?: string };
    if (cell.richText) return cell.richText.map((part) => part.text).join('');
    if ('result' in cell) return cellText(cell.result);
    if (typeof cell.text === 'string') return cell.text;
    return '';
  }
  return typeof value === 'bigint' ? value.toString() : '';
}
