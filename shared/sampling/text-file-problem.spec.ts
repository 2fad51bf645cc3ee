import { notTextMessage, notUtf8Message, textFileProblem } from './text-file-problem';

/** Bytes as the browser's File.text() and the server's body reader turn them into text. */
const decoded = (...bytes: number[]) => new TextDecoder('utf-8').decode(new Uint8Array(bytes));
const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

const pngOpening = [0x89, ...ascii('PNG'), 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, ...ascii('IHDR')];
const zipOpening = [...ascii('PK'), 3, 4, 0x14, 0, 0, 0, 8, 0, ...ascii('[Content_Types].xml')];

describe('textFileProblem', () => {
  it('accepts UTF-8 text with accents, a byte-order mark and CRLF line ends', () => {
    expect(textFileProblem('\uFEFFpoint_code,point_name\r\nA1,Café Ñandú\r\n')).toBeUndefined();
  });

  it('refuses a PNG image on line 1 with one problem', () => {
    expect(textFileProblem(decoded(...pngOpening))).toEqual({
      line: 1,
      column: '',
      message: notTextMessage,
    });
  });

  it('refuses a workbook or other ZIP archive renamed .csv', () => {
    expect(textFileProblem(decoded(...zipOpening))?.message).toBe(notTextMessage);
  });

  it('refuses a PDF even when its opening has no unreadable bytes', () => {
    expect(textFileProblem('%PDF-1.7\n1 0 obj\n')?.message).toBe(notTextMessage);
  });

  it('refuses text holding a NUL, as UTF-16 text does', () => {
    expect(textFileProblem(decoded(0xff, 0xfe, ...ascii('p'), 0, ...ascii('o'), 0))).toEqual({
      line: 1,
      column: '',
      message: notTextMessage,
    });
  });

  it('names the first line with bytes that are not UTF-8, as in a Latin-1 export', () => {
    const text = decoded(...ascii('point_code\r\nA1\r\nB2,Caf'), 0xe9, ...ascii('\nC3,Caf'), 0xe9);
    expect(textFileProblem(text)).toEqual({ line: 3, column: '', message: notUtf8Message });
  });
});
