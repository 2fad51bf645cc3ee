import type PDFDocument from 'pdfkit';
import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { reportNumber } from './report-number';
import { largest } from '@shared/estimation/numerics/extent';

type Doc = InstanceType<typeof PDFDocument>;

export interface ChartBox {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** About five round tick values (1, 2 or 5 × 10ᵏ apart) covering [low, high]. */
export function niceTicks(low: number, high: number, count = 5): number[] {
  const raw = (high - low) / count || 1;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const ticks: number[] = [];
  for (let t = Math.ceil(low / step) * step; t <= high + step * 1e-9; t += step)
    ticks.push(Number(t.toPrecision(12)));
  return ticks;
}

/**
 * The demand curve as vector graphics: the confidence band as a filled polygon, the curve as a
 * stroked path (dashed where it is extrapolation), and axes with ticks and labels.
 */
export function drawScheduleChart(doc: Doc, version: ScheduleVersion, box: ChartBox): void {
  const rows = version.rows;
  const xTicks = niceTicks(rows[0].price, rows[rows.length - 1].price);
  const top = largest(rows.map((r) => Math.max(r.ciHigh ?? r.quantity, r.quantity)));
  const yTicks = niceTicks(0, top > 0 ? top : 1);
  const xMin = Math.min(rows[0].price, xTicks[0]);
  const xMax = Math.max(rows[rows.length - 1].price, xTicks[xTicks.length - 1]);
  const yMax = Math.max(yTicks[yTicks.length - 1], top);
  const x = (p: number) => box.x + ((p - xMin) / (xMax - xMin || 1)) * box.width;
  const y = (q: number) => box.y + box.height - (q / (yMax || 1)) * box.height;
  const banded = rows.filter((r) => r.ciLow !== null && r.ciHigh !== null);
  if (banded.length > 1) {
    doc.moveTo(x(banded[0].price), y(banded[0].ciHigh!));
    banded.slice(1).forEach((r) => doc.lineTo(x(r.price), y(r.ciHigh!)));
    [...banded].reverse().forEach((r) => doc.lineTo(x(r.price), y(r.ciLow!)));
    doc.closePath().fillColor('#cfe0ef').fill();
  }
  rows.slice(1).forEach((r, i) => {
    const previous = rows[i];
    doc
      .moveTo(x(previous.price), y(previous.quantity))
      .lineTo(x(r.price), y(r.quantity))
      .lineWidth(1.6);
    if (previous.extrapolated || r.extrapolated) doc.dash(4, { space: 3 });
    doc.strokeColor('#1d4f7a').stroke().undash();
  });
  drawAxes(doc, box, {
    xTicks,
    yTicks,
    x,
    y,
    quantityKind: version.quantityKind,
    currency: version.currency,
  });
}

function drawAxes(
  doc: Doc,
  box: ChartBox,
  axes: {
    xTicks: number[];
    yTicks: number[];
    x: (p: number) => number;
    y: (q: number) => number;
    quantityKind: string;
    currency: string;
  },
): void {
  const bottom = box.y + box.height;
  doc.lineWidth(0.8).strokeColor('#333333');
  doc
    .moveTo(box.x, box.y)
    .lineTo(box.x, bottom)
    .lineTo(box.x + box.width, bottom)
    .stroke();
  doc.fontSize(7).fillColor('#333333');
  for (const t of axes.xTicks) {
    doc
      .moveTo(axes.x(t), bottom)
      .lineTo(axes.x(t), bottom + 4)
      .stroke();
    doc.text(reportNumber(t), axes.x(t) - 20, bottom + 6, {
      width: 40,
      align: 'center',
      lineBreak: false,
    });
  }
  for (const t of axes.yTicks) {
    doc
      .moveTo(box.x - 4, axes.y(t))
      .lineTo(box.x, axes.y(t))
      .stroke();
    doc.text(reportNumber(t), box.x - 46, axes.y(t) - 3, {
      width: 40,
      align: 'right',
      lineBreak: false,
    });
  }
  doc.fontSize(8);
  doc.text(`Price (${axes.currency})`, box.x, bottom + 18, {
    width: box.width,
    align: 'center',
    lineBreak: false,
  });
  const label = axes.quantityKind === 'share' ? 'Purchase share' : 'Quantity (units per 30 days)';
  doc.text(label, box.x, box.y - 14, { lineBreak: false });
}
