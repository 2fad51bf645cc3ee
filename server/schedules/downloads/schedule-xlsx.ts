import ExcelJS from 'exceljs';
import { estimateCaution, type ScheduleVersion } from '@shared/analysis/schedule-version';
import { publishedWhen } from './published-when';
import { estimateNote, levelText, minorDigits, scheduleColumns } from './schedule-table';
import { specLines } from './spec-lines';

/** Excel number formats per column, in `scheduleColumns` order. */
function columnFormats(version: ScheduleVersion): string[] {
  const cents = minorDigits(version.currency);
  const money = `"${version.currency} "#,##0${cents ? `.${'0'.repeat(cents)}` : ''}`;
  const amount = version.quantityKind === 'share' ? '0.00%' : '#,##0.00';
  return [money, amount, amount, amount, money, '0.000', '@', '0'];
}

/**
 * A workbook with the schedule (row 1 the estimate note, row 2 the header, data from row 3, so
 * a planning sheet can refer to fixed cells; values at full precision, shown with number
 * formats) and a second sheet saying how it was made, in words.
 */
export async function scheduleXlsx(version: ScheduleVersion): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Fieldcurve';
  workbook.created = new Date(version.publishedAt);
  const sheet = workbook.addWorksheet('Schedule');
  sheet.addRow([estimateNote(version)]).font = { italic: true };
  const header = sheet.addRow(scheduleColumns(version));
  header.font = { bold: true };
  header.alignment = { wrapText: true, vertical: 'bottom' };
  for (const r of version.rows) {
    sheet.addRow([
      r.price,
      r.quantity,
      r.ciLow,
      r.ciHigh,
      r.revenue,
      r.elasticity,
      r.extrapolated ? 'yes' : 'no',
      r.respondents,
    ]);
  }
  columnFormats(version).forEach((format, i) => {
    const column = sheet.getColumn(i + 1);
    column.width = 18;
    column.numFmt = format;
  });
  sheet.views = [{ state: 'frozen', ySplit: 2 }];
  const about = workbook.addWorksheet('About');
  const facts: [string, string | number][] = [
    ['Title', version.title],
    ['Version', version.version],
    ['Study', version.studyName],
    ['Product', version.productName],
    ['Method', version.methodLabel],
    ['Respondents (n)', version.n],
    ['Confidence level', levelText(version.confidenceLevel)],
    ['Currency', version.currency],
    ['Data hash (SHA-256)', version.dataHash],
    ['Published', `${publishedWhen(version.publishedAt)} by ${version.publishedByName}`],
    ['Replaces', version.replacesId ? 'an earlier version of this schedule' : 'nothing'],
    ['Caution', estimateCaution],
    ...specLines(version.spec, version.currency).map(([label, text]): [string, string] => [
      `Specification: ${label.toLowerCase()}`,
      text,
    ]),
    ...version.assumptions.map((a, i): [string, string] => [`Assumption ${i + 1}`, a]),
  ];
  for (const fact of facts) about.addRow(fact);
  about.getColumn(1).width = 34;
  about.getColumn(2).width = 100;
  about.getColumn(2).alignment = { wrapText: true, vertical: 'top' };
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
