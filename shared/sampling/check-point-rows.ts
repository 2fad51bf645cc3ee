import type { CsvProblem } from './csv-problem';
import type { CsvRow } from './read-csv-rows';
import type { ColumnLayout, SamplingPointField } from './sampling-csv-columns';
import { samplingPointRowSchema, type SamplingPointInput } from './sampling-point';

type RowCheck = { point?: SamplingPointInput; problems: CsvProblem[] };

/**
 * Checks each data row against the row schema using only the columns the header has (a missing
 * column is reported once, on the header, not on every row), then looks for codes used twice.
 */
export function checkPointRows(
  rows: readonly CsvRow[],
  layout: ColumnLayout,
  headerWidth: number,
): { points: SamplingPointInput[]; problems: CsvProblem[] } {
  const check = rowChecker(layout);
  const points: SamplingPointInput[] = [];
  const problems: CsvProblem[] = [];
  const wellFormed = rows.filter((row) => row.cells.length === headerWidth);
  for (const row of rows) {
    if (row.cells.length !== headerWidth) {
      problems.push(widthProblem(row, headerWidth));
      continue;
    }
    const result = check(row);
    problems.push(...result.problems);
    if (result.point) points.push(result.point);
  }
  problems.push(...duplicateCodes(wellFormed, layout));
  return { points, problems };
}

function rowChecker(layout: ColumnLayout): (row: CsvRow) => RowCheck {
  const mask = Object.fromEntries([...layout.keys()].map((c) => [c.field, true as const]));
  const schema = samplingPointRowSchema.pick(mask);
  const headerOf = new Map<string, string>([...layout.keys()].map((c) => [c.field, c.header]));
  return (row) => {
    const cells: Partial<Record<SamplingPointField, string>> = {};
    for (const [column, index] of layout) cells[column.field] = row.cells[index];
    const parsed = schema.safeParse(cells);
    if (parsed.success) {
      // Without a notes column the schema never sees the field, so its default does not apply.
      return {
        point: Object.assign({ notes: '' }, parsed.data) as SamplingPointInput,
        problems: [],
      };
    }
    const problems = parsed.error.issues.map((issue) => ({
      line: row.line,
      column: headerOf.get(String(issue.path[0])) ?? '',
      message: issue.message,
    }));
    return { problems };
  };
}

function duplicateCodes(rows: readonly CsvRow[], layout: ColumnLayout): CsvProblem[] {
  const codeColumn = [...layout.keys()].find((column) => column.field === 'code');
  if (!codeColumn) return [];
  const index = layout.get(codeColumn) ?? 0;
  const firstLine = new Map<string, number>();
  const problems: CsvProblem[] = [];
  for (const row of rows) {
    const code = samplingPointRowSchema.shape.code.safeParse(row.cells[index]).data;
    if (code === undefined) continue;
    const earlier = firstLine.get(code);
    if (earlier === undefined) firstLine.set(code, row.line);
    else
      problems.push({
        line: row.line,
        column: codeColumn.header,
        message: `The code "${code}" is already used on line ${earlier}; codes must be unique.`,
      });
  }
  return problems;
}

function widthProblem(row: CsvRow, headerWidth: number): CsvProblem {
  return {
    line: row.line,
    column: '',
    message: `This row has ${row.cells.length} cells but the header has ${headerWidth}; check for a missing or extra separator.`,
  };
}
