import ExcelJS from 'exceljs';
import { estimateCaution, type ScheduleVersion } from '@shared/analysis/schedule-version';
import { estimateNote, scheduleCells, scheduleColumns } from './schedule-table';

/**
 * A workbook with the schedule (row 1 the estimate note, row 2 the header, data from row 3, so
 * a planning sheet can refer to fixed cells) and a second sheet describing how it was made.
 */
export async function scheduleXlsx(version: ScheduleVersion): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Fieldcurve';
  workbook.created = new Date(version.publishedAt);
  const sheet = workbook.addWorksheet('Schedule');
  sheet.addRow([estimateNote(version)]).font = { italic: true };
  const header = sheet.addRow(scheduleColumns(version));
  header.font = { bold: true };
  for (const row of scheduleCells(version)) sheet.addRow(row);
  sheet.columns.forEach((column) => (column.width = 16));
  sheet.views = [{ state: 'frozen', ySplit: 2 }];
  const about = workbook.addWorksheet('About');
  const facts: [string, string | number][] = [
    ['Title', version.title],
    ['Version', version.version],
    ['Study', version.studyName],
    ['Product', version.productName],
    ['Method', version.methodLabel],
    ['Respondents (n)', version.n],
    ['Confidence level', version.confidenceLevel],
    ['Currency', version.currency],
    ['Data hash (SHA-256)', version.dataHash],
    ['Published', `${version.publishedAt} by ${version.publishedByName}`],
    ['Replaces version', version.replacesId ?? 'none'],
    ['Specification', JSON.stringify(version.spec)],
    ['Caution', estimateCaution],
    ...version.assumptions.map((a, i): [string, string] => [`Assumption ${i + 1}`, a]),
  ];
  for (const fact of facts) about.addRow(fact);
  about.getColumn(1).width = 24;
  about.getColumn(2).width = 100;
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
