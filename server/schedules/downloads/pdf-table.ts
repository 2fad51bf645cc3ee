import type PDFDocument from 'pdfkit';
import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { reportMoney } from './report-money';
import { reportNumber } from './report-number';
import { levelText } from './schedule-table';

type Doc = InstanceType<typeof PDFDocument>;

const widths = [66, 64, 62, 62, 78, 58, 54, 38];

/** The schedule's rows as a table, continued on new pages (header repeated) as needed. */
export function drawScheduleTable(doc: Doc, version: ScheduleVersion, left: number): void {
  const level = levelText(version.confidenceLevel);
  const share = version.quantityKind === 'share';
  const headers = [
    `Price`,
    share ? 'Purchase share' : 'Quantity',
    `${level} interval low`,
    `${level} interval high`,
    share ? 'Revenue per potential buyer' : 'Revenue',
    'Elasticity',
    'Respondents',
    'Extrap.',
  ];
  const money = reportMoney(version.currency);
  const line = (cells: string[], bold: boolean, height: number) => {
    if (doc.y > doc.page.height - doc.page.margins.bottom - height - 4) {
      doc.addPage();
      if (!bold) line(headers, true, 24);
    }
    const y = doc.y;
    doc
      .font(bold ? 'Fira-Bold' : 'Fira')
      .fontSize(bold ? 7 : 8)
      .fillColor('#222222');
    let x = left;
    cells.forEach((text, i) => {
      doc.text(text, x, y, { width: widths[i] - 4, align: 'right', lineBreak: bold });
      x += widths[i];
    });
    doc.x = left;
    doc.y = y + height;
  };
  line(headers, true, 24);
  for (const r of version.rows) {
    line(
      [
        money(r.price),
        reportNumber(r.quantity),
        reportNumber(r.ciLow),
        reportNumber(r.ciHigh),
        money(r.revenue),
        reportNumber(r.elasticity),
        String(r.respondents),
        r.extrapolated ? 'yes' : '',
      ],
      false,
      13,
    );
  }
}
