import PDFDocument from 'pdfkit';
import { estimateCaution, type ScheduleVersion } from '@shared/analysis/schedule-version';
import { drawScheduleChart } from './pdf-chart';
import { drawScheduleTable } from './pdf-table';
import { reportFonts } from './report-fonts';
import { publishedWhen } from './published-when';
import { reportMoney } from './report-money';
import { reportNumber } from './report-number';
import { levelText } from './schedule-table';
import { specLines } from './spec-lines';

const margin = 56;

/**
 * The client's PDF report: what the schedule is, the caution that its figures are estimates,
 * the method, sample, intervals, observed prices, weighting and data hash, the curve with its band
 * drawn as vector graphics, the table with money in the study's currency, the assumptions and
 * the specification in words. Fira Sans is embedded.
 */
export function schedulePdf(version: ScheduleVersion): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margin,
    info: { Title: version.title, Creator: 'Fieldcurve' },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.registerFont('Fira', reportFonts.regular);
  doc.registerFont('Fira-Bold', reportFonts.bold);
  const width = doc.page.width - 2 * margin;
  doc.font('Fira-Bold').fontSize(16).fillColor('#1d2b36').text(`Demand schedule: ${version.title}`);
  doc.font('Fira').fontSize(10).fillColor('#444444');
  doc.text(`${version.studyName} · ${version.productName} · version ${version.version}`);
  doc.text(`Published ${publishedWhen(version.publishedAt)} by ${version.publishedByName}`);
  doc.moveDown(0.6);
  doc.font('Fira-Bold').fillColor('#8a4b00').text('Estimates, not advice');
  doc.font('Fira').fillColor('#333333').text(estimateCaution, { width });
  doc.moveDown(0.6);
  const money = reportMoney(version.currency);
  const facts = [
    `Method: ${version.methodLabel}`,
    `Sample: n = ${version.n} respondents`,
    `Intervals: ${levelText(version.confidenceLevel)} confidence band around each prediction`,
    `Observed prices: ${money(version.observedPriceRange.min)} to ${money(version.observedPriceRange.max)}; prices outside are extrapolation (dashed)`,
    ...(version.quantityKind === 'share'
      ? ['Revenue: per potential buyer (price × purchase share), not per buyer']
      : []),
    ...(version.weighting
      ? [
          `Weighting: raked to ${version.weighting.variables.join(', ')}; design effect ${reportNumber(version.weighting.designEffect)}, effective sample size ${reportNumber(version.weighting.effectiveSampleSize)}`,
        ]
      : []),
    `Data hash (SHA-256): ${version.dataHash}`,
  ];
  facts.forEach((fact) => doc.text(fact, { width }));
  doc.moveDown(2);
  const box = { x: margin + 40, y: doc.y, width: width - 50, height: 190 };
  drawScheduleChart(doc, version, box);
  doc.x = margin;
  doc.y = box.y + box.height + 34;
  drawScheduleTable(doc, version, margin);
  doc.moveDown(1);
  doc.x = margin;
  doc.font('Fira-Bold').fontSize(10).fillColor('#1d2b36').text('Assumptions', { width });
  doc.font('Fira').fontSize(8).fillColor('#333333');
  for (const assumption of version.assumptions) doc.text(`• ${assumption}`, { width });
  doc.moveDown(1);
  doc.font('Fira-Bold').fontSize(10).fillColor('#1d2b36').text('Specification', { width });
  doc.font('Fira').fontSize(8).fillColor('#333333');
  for (const [label, text] of specLines(version.spec, version.currency))
    doc.text(`${label}: ${text}`, { width });
  doc.end();
  return done;
}
