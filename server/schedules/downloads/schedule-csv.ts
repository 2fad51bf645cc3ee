import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { estimateNote, scheduleCells, scheduleColumns, type TableCell } from './schedule-table';

const cell = (value: TableCell) => {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  const text = String(value);
  return /[",\n\r#]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

/**
 * The schedule as plain CSV: a first comment line (`# Estimate: …`) saying what the numbers
 * are, the header, then one row per grid price with numbers at full precision.
 */
export function scheduleCsv(version: ScheduleVersion): string {
  const lines = [
    `# ${estimateNote(version).replace(/[\r\n]+/g, ' ')}`,
    scheduleColumns(version).join(','),
    ...scheduleCells(version).map((row) => row.map(cell).join(',')),
  ];
  return `${lines.join('\r\n')}\r\n`;
}
