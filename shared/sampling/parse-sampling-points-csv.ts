import { sortProblems, type CsvProblem } from './csv-problem';
import { readCsvRows, type CsvRow } from './read-csv-rows';
import {
  columnForHeader,
  maxPointsPerFile,
  samplingCsvColumns,
  type ColumnLayout,
  type SamplingCsvColumn,
} from './sampling-csv-columns';
import { checkPointRows } from './check-point-rows';
import { textFileProblem } from './text-file-problem';
import type { SamplingPointInput } from './sampling-point';

/** Either every point of the file, or every problem found in it (and then no points at all). */
export type SamplingCsvResult =
  | { readonly ok: true; readonly points: SamplingPointInput[] }
  | { readonly ok: false; readonly problems: CsvProblem[] };

const isBlank = (row: CsvRow) => row.cells.every((cell) => cell.trim() === '');

/**
 * Reads a sampling-point file (see {@link samplingCsvColumns} for the contract). All or nothing:
 * a single bad cell refuses the file, and the answer lists every problem with its file line
 * (header = line 1) and column, so the whole file can be fixed in one pass. A file that is not
 * UTF-8 text (an image, a workbook) gets that one problem instead of a list about its "cells".
 */
export function parseSamplingPointsCsv(text: string): SamplingCsvResult {
  const notText = textFileProblem(text);
  if (notText) return refuse([notText]);
  const { rows, unclosedQuoteLine } = readCsvRows(text);
  const nonBlank = rows.filter((row) => !isBlank(row));
  if (nonBlank.length === 0) return refuse([fileProblem(1, 'The file is empty.')]);
  const [header, ...body] = nonBlank;
  const { layout, problems } = readHeader(header);
  if (unclosedQuoteLine !== undefined) {
    problems.push(
      fileProblem(unclosedQuoteLine, 'A quoted cell starting on this line is never closed.'),
    );
    return refuse(problems);
  }
  if (body.length === 0) problems.push(fileProblem(1, 'The file has a header but no points.'));
  if (body.length > maxPointsPerFile) {
    problems.push(
      fileProblem(
        body[maxPointsPerFile].line,
        `A file may hold at most ${maxPointsPerFile} points.`,
      ),
    );
    return refuse(problems);
  }
  const checked = checkPointRows(body, layout, header.cells.length);
  problems.push(...checked.problems);
  return problems.length > 0 ? refuse(problems) : { ok: true, points: checked.points };
}

function readHeader(header: CsvRow): { layout: ColumnLayout; problems: CsvProblem[] } {
  const layout = new Map<SamplingCsvColumn, number>();
  const problems: CsvProblem[] = [];
  const known = samplingCsvColumns.map((c) => c.header).join(', ');
  header.cells.forEach((cell, index) => {
    const column = columnForHeader(cell);
    const shown = cell.trim() || `column ${index + 1}`;
    if (!column) {
      problems.push({
        line: 1,
        column: shown,
        message: `Unknown column; the columns are ${known}.`,
      });
    } else if (layout.has(column)) {
      problems.push({ line: 1, column: column.header, message: 'This column appears twice.' });
    } else {
      layout.set(column, index);
    }
  });
  for (const column of samplingCsvColumns) {
    if (column.required && !layout.has(column)) {
      problems.push({ line: 1, column: column.header, message: 'Missing column; it is required.' });
    }
  }
  return { layout, problems };
}

const fileProblem = (line: number, message: string): CsvProblem => ({ line, column: '', message });

const refuse = (problems: CsvProblem[]): SamplingCsvResult => ({
  ok: false,
  problems: sortProblems(problems),
});
