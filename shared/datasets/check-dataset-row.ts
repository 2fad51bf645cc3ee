import type { ColumnMapping } from './dataset-columns';
import type { ImportProblem } from './dataset-resource';

/** A stored column and where its values stand in each file record. */
export interface PlannedColumn {
  readonly mapping: ColumnMapping;
  /** 0-based position of the column in the file's header. */
  readonly index: number;
}

/** A checked value as COPY takes it: a number, a day (YYYY-MM-DD), a label, or null. */
export type StoredValue = number | string | null;

const numberPattern = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const dayPattern = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Roles whose cells must hold a value on every row. */
const requiredValueRoles = new Set(['price', 'quantity', 'weight']);

/**
 * Checks one file record against the mapping and converts it: numbers must be plain decimals
 * (no text, no thousands separators), prices and quantities not negative, weights above zero,
 * dates real calendar days written YYYY-MM-DD, labels free of NUL. Answers the typed values or
 * every problem of the record, each naming the file line and column.
 */
export function checkDatasetRow(
  record: readonly string[],
  line: number,
  plan: readonly PlannedColumn[],
): { values: StoredValue[] } | { problems: ImportProblem[] } {
  const values: StoredValue[] = [];
  const problems: ImportProblem[] = [];
  for (const { mapping, index } of plan) {
    const problem = (message: string) => problems.push({ line, column: mapping.source, message });
    const raw = index < record.length ? record[index].trim() : undefined;
    if (raw === undefined || raw === '') {
      if (requiredValueRoles.has(mapping.role)) {
        problem(
          raw === undefined
            ? `the row has no ${mapping.source} column (only ${record.length} fields)`
            : `${mapping.source} is empty; every row needs a ${mapping.role}`,
        );
      }
      values.push(null);
      continue;
    }
    if (mapping.type === 'number') {
      const value = numberPattern.test(raw) ? Number(raw) : NaN;
      if (!Number.isFinite(value)) {
        problem(`"${shorten(raw)}" is not a number (write plain decimals such as 12.5)`);
      } else if ((mapping.role === 'price' || mapping.role === 'quantity') && value < 0) {
        problem(`a ${mapping.role} cannot be negative (${raw})`);
      } else if (mapping.role === 'weight' && !(value > 0)) {
        problem(`a weight must be above zero (${raw})`);
      }
      values.push(value);
    } else if (mapping.type === 'date') {
      if (!isCalendarDay(raw)) problem(`"${shorten(raw)}" is not a date written YYYY-MM-DD`);
      values.push(raw);
    } else {
      if (raw.includes('\u0000')) problem('the text holds a NUL character');
      else if (raw.length > 200) problem('labels are limited to 200 characters');
      values.push(raw);
    }
  }
  return problems.length > 0 ? { problems } : { values };
}

function isCalendarDay(text: string): boolean {
  const parts = dayPattern.exec(text);
  if (!parts) return false;
  const [year, month, day] = parts.slice(1).map(Number);
  if (year < 1) return false;
  const date = new Date(Date.UTC(year, month - 1, day));
  return (
    date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day
  );
}

function shorten(text: string): string {
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

/**
 * Places each mapped (not ignored) column in the header; a mapped column the header lacks is a
 * problem of line 1.
 */
export function planColumns(
  header: readonly string[],
  columns: readonly ColumnMapping[],
): { plan: PlannedColumn[] } | { problems: ImportProblem[] } {
  const names = header.map((h) => h.trim());
  const plan: PlannedColumn[] = [];
  const problems: ImportProblem[] = [];
  for (const mapping of columns) {
    if (mapping.role === 'ignore') continue;
    const index = names.indexOf(mapping.source);
    if (index < 0) {
      problems.push({
        line: 1,
        column: mapping.source,
        message: `the file has no column "${mapping.source}" (its columns: ${names.join(', ') || 'none'})`,
      });
    } else plan.push({ mapping, index });
  }
  return problems.length > 0 ? { problems } : { plan };
}

/** A stored-column name suggested from a header: lower case, underscores, a letter first. */
export function suggestedName(header: string, taken: ReadonlySet<string>): string {
  let base = header
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '')
    .slice(0, 36);
  if (!/^[a-z]/.test(base)) base = `c_${base}`.slice(0, 36);
  if (base === 'line' || base === 'c_') base = `${base}_col`;
  let name = base;
  for (let i = 2; taken.has(name); i++) name = `${base}_${i}`;
  return name;
}
