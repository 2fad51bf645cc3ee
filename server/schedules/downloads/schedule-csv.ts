import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { estimateNote, scheduleCells, scheduleColumns, type TableCell } from './schedule-table';

const cell = (value: TableCell) => {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  const text = String(value);
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

/**
 * The schedule as plain CSV that spreadsheets and data tools read without help: the header row
 * first, one row per grid price with rounded values, and a last column "Note" whose first cell
 * says the figures are estimates (a comment line above the header would be taken for data).
 */
export function scheduleCsv(version: ScheduleVersion): string {
  const note = estimateNote(version).replace(/[\r\n]+/g, ' ');
  const lines = [
    [...scheduleColumns(version), 'Note'].map(cell).join(','),
    ...scheduleCells(version).map((row, i) => [...row, i === 0 ? note : null].map(cell).join(',')),
  ];
  return `${lines.join('\r\n')}\r\n`;
}
