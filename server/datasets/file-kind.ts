import type { DatasetFormat } from '@shared/datasets/dataset-upload';

/** An XLSX workbook is a ZIP archive; its first bytes say so. */
const zipSignature = Buffer.from([0x50, 0x4b, 0x03, 0x04]);

/**
 * What the first bytes of a file say it is, checked against the name's extension: a workbook
 * must be a ZIP archive, a CSV must be text (no NUL bytes, no ZIP or other binary start).
 * Answers a sentence naming the problem, or null.
 */
export function fileKindProblem(format: DatasetFormat, head: Buffer): string | null {
  if (head.length === 0) return 'The file is empty.';
  const zipped = head.subarray(0, 4).equals(zipSignature);
  if (format === 'xlsx') {
    return zipped ? null : 'The file is named .xlsx but is not an Excel workbook.';
  }
  if (zipped || head.includes(0)) {
    return 'The file is not a CSV text file (it holds binary data); export it as CSV or XLSX.';
  }
  return null;
}
