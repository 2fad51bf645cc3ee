import type PDFDocument from 'pdfkit';
import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { reportNumber } from './report-number';

type Doc = InstanceType<typeof PDFDocument>;

const widths = [62, 72, 62, 62, 72, 62, 50, 50];

/** The schedule's rows as a table, continued on new pages as needed. */
export function drawScheduleTable(doc: Doc, version: ScheduleVersion, left: number): void {
  const headers = [
    'Price',
    version.quantityKind === 'share' ? 'Share' : 'Quantity',
    'Low',
    'High',
    'Revenue',
    'Elasticity',
    'n',
    'Extrap.',
  ];
  const line = (cells: string[], bold: boolean) => {
    if (doc.y > doc.page.height - doc.page.margins.bottom - 16) doc.addPage();
    const y = doc.y;
    doc
      .font(bold ? 'Fira-Bold' : 'Fira')
      .fontSize(8)
      .fillColor('#222222');
    let x = left;
    cells.forEach((text, i) => {
      doc.text(text, x, y, {
        width: widths[i] - 4,
        align: i === 7 ? 'center' : 'right',
        lineBreak: false,
      });
      x += widths[i];
    });
    doc.x = left;
    doc.y = y + 13;
  };
  line(headers, true);
  for (const r of version.rows) {
    line(
      [
        reportNumber(r.price),
        reportNumber(r.quantity),
        reportNumber(r.ciLow),
        reportNumber(r.ciHigh),
        reportNumber(r.revenue),
        reportNumber(r.elasticity),
        String(r.respondents),
        r.extrapolated ? 'yes' : '',
      ],
      false,
    );
  }
}
