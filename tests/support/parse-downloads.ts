import type { Response } from 'superagent';
import ExcelJS from 'exceljs';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

/** A binary response body as a Buffer (supertest leaves binary types unparsed without this). */
export function binaryParser(
  res: Response,
  done: (error: Error | null, body: unknown) => void,
): void {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
}

/** The cells of a worksheet as rows of values, read back with exceljs. */
export async function xlsxRows(body: Buffer, sheetName: string): Promise<unknown[][]> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(body as unknown as ArrayBuffer);
  const sheet = workbook.getWorksheet(sheetName);
  if (!sheet) throw new Error(`no sheet ${sheetName}`);
  const rows: unknown[][] = [];
  sheet.eachRow({ includeEmpty: true }, (row) => {
    rows.push((row.values as unknown[]).slice(1));
  });
  return rows;
}

/** Every text item of a PDF, page by page, joined by spaces (pdf.js text extraction). */
export async function pdfText(body: Buffer): Promise<string> {
  const pdf = await getDocument({
    data: new Uint8Array(body),
    disableFontFace: true,
    useSystemFonts: false,
  }).promise;
  const pages: string[] = [];
  for (let p = 1; p <= pdf.numPages; p++) {
    const content = await (await pdf.getPage(p)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' '));
  }
  await pdf.destroy();
  return pages.join('\n');
}

/** Data rows of a schedule CSV after its comment line and header. */
export function csvRows(text: string): { comment: string; header: string[]; rows: string[][] } {
  const lines = text.trim().split(/\r\n/);
  return {
    comment: lines[0],
    header: lines[1].split(','),
    rows: lines.slice(2).map((l) => l.split(',')),
  };
}
