import Papa from 'papaparse';
import { largest } from '../estimation/numerics/extent';

/** One physical record of a CSV file with the file line it starts on (line 1 is the first). */
export interface CsvRow {
  readonly line: number;
  readonly cells: string[];
}

export interface CsvRows {
  readonly rows: CsvRow[];
  /** Set when a quoted cell never closes: the rest of the file cannot be read reliably. */
  readonly unclosedQuoteLine?: number;
}

const separators = [',', ';', '\t'] as const;

/** The separator the header line uses most: comma unless the header plainly uses ; or tab. */
function separatorOf(text: string): string {
  const firstLine = text.split(/\r?\n/, 1)[0];
  const counts = separators.map((s) => firstLine.split(s).length - 1);
  const best = counts.indexOf(largest(counts));
  return counts[best] > 0 ? separators[best] : ',';
}

function countLineBreaks(text: string, from: number, to: number): number {
  let breaks = 0;
  for (let i = from; i < to; i += 1) {
    const c = text.charCodeAt(i);
    // \r\n counts once (at its \n); a lone \r (old Mac files) counts too.
    if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) breaks += 1;
  }
  return breaks;
}

/**
 * Splits CSV text into records with papaparse, keeping each record's starting line so problems
 * can point at the line a spreadsheet or editor shows (a quoted cell may span several lines).
 * A leading byte-order mark is dropped; CRLF, LF and CR line ends are all accepted.
 */
export function readCsvRows(input: string): CsvRows {
  const text = input.replace(/^\uFEFF/, '');
  const rows: CsvRow[] = [];
  let unclosedQuoteLine: number | undefined;
  let start = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    delimiter: separatorOf(text),
    step: (result) => {
      const end = result.meta.cursor;
      if (result.errors.some((e) => e.code === 'MissingQuotes')) unclosedQuoteLine ??= line;
      rows.push({ line, cells: result.data });
      line += countLineBreaks(text, start, end);
      start = end;
    },
  });
  return { rows, unclosedQuoteLine };
}
