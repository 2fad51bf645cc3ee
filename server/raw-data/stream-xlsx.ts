import type { Writable } from 'node:stream';
import ExcelJS from 'exceljs';
import type { RawCell } from '@shared/raw-data/answer-parts';
import type { RawColumn } from '@shared/raw-data/raw-data-column';
import { neutraliseFormula } from '@shared/raw-data/spreadsheet-text';
import { waitForDrain } from './write-or-wait';

const cell = (value: RawCell) => (typeof value === 'string' ? neutraliseFormula(value) : value);

/**
 * A workbook written as it goes (exceljs's streaming writer): the interviews sheet row by row,
 * each row committed and gone, then the data dictionary as a second sheet. Inline strings and no
 * styles keep the writer from collecting a table of every text it has seen.
 */
export async function streamXlsx(
  out: Writable,
  columns: readonly RawColumn[],
  rows: AsyncIterable<RawCell[]>,
): Promise<number> {
  const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({
    stream: out,
    useStyles: false,
    useSharedStrings: false,
  });
  const sheet = workbook.addWorksheet('Interviews');
  sheet.addRow(columns.map((c) => cell(c.name))).commit();
  let count = 0;
  for await (const row of rows) {
    sheet.addRow(row.map(cell)).commit();
    count++;
    await waitForDrain(out);
  }
  sheet.commit();
  const dictionary = workbook.addWorksheet('Dictionary');
  dictionary
    .addRow(['column', 'type', 'unit', 'allowed values', 'questionnaire versions', 'meaning'])
    .commit();
  for (const column of columns) {
    dictionary
      .addRow(
        [
          column.name,
          column.type,
          column.unit ?? '',
          column.allowed?.join(', ') ?? '',
          column.questionnaireVersions?.join(', ') ?? 'all',
          column.description,
        ].map(cell),
      )
      .commit();
  }
  dictionary.commit();
  await workbook.commit();
  return count;
}
