import type { CsvProblem } from './csv-problem';

/**
 * Openings of files a supervisor may pick by mistake (a workbook, a photo, a PDF), as they read
 * once decoded as UTF-8: bytes that are not UTF-8 become U+FFFD, so PNG's 0x89 shows as \uFFFD.
 */
const binaryOpenings = ['PK\u0003\u0004', '%PDF-', '\uFFFDPNG', 'GIF87a', 'GIF89a'];

/** Decoders put U+FFFD where a byte sequence is not UTF-8. */
const unreadable = '\uFFFD';

export const notTextMessage =
  'This file is not a CSV text file: save the sheet as CSV (comma-separated) and upload that.';

export const notUtf8Message =
  'This line has characters that cannot be read as UTF-8: save the sheet as CSV UTF-8 (comma-separated) and upload that.';

/**
 * The one problem of an upload that is not UTF-8 text, or undefined when it is. Checked before
 * any cell is read, because a binary file split into "rows" only yields a misleading list of
 * garbled headers and cell counts.
 */
export function textFileProblem(text: string): CsvProblem | undefined {
  // NUL never occurs in a spreadsheet's CSV, but does in images, archives and UTF-16 text.
  if (text.includes('\u0000') || binaryOpenings.some((opening) => text.startsWith(opening))) {
    return { line: 1, column: '', message: notTextMessage };
  }
  const at = text.indexOf(unreadable);
  if (at === -1) return undefined;
  return { line: lineAt(text, at), column: '', message: notUtf8Message };
}

/** The file line (1-based) of a character, counting CRLF, LF and a lone CR as one line end. */
function lineAt(text: string, index: number): number {
  const before = text.slice(0, index);
  return before.split(/\r\n|\r|\n/).length;
}
