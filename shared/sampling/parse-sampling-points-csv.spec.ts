import { parseSamplingPointsCsv, type SamplingCsvResult } from './parse-sampling-points-csv';
import { samplingCsvHeaderLine } from './sampling-csv-columns';

const header = 'point_code,point_name,point_kind,latitude,longitude,stratum,notes';
const file = (...rows: string[]) => [header, ...rows].join('\n');

function problemsOf(result: SamplingCsvResult) {
  if (result.ok) throw new Error('expected the file to be refused');
  return result.problems;
}

describe('parseSamplingPointsCsv', () => {
  it('reads a good file into typed points', () => {
    const result = parseSamplingPointsCsv(
      file(
        'NRT-001,Corner shop by the well,shop,-1.2864,36.8172,North,Opens at 7',
        'NRT-002,Stall 14,Market stall,-1.29,36.82,North,',
      ),
    );
    expect(result).toEqual({
      ok: true,
      points: [
        {
          code: 'NRT-001',
          name: 'Corner shop by the well',
          kind: 'shop',
          latitude: -1.2864,
          longitude: 36.8172,
          stratum: 'North',
          notes: 'Opens at 7',
        },
        {
          code: 'NRT-002',
          name: 'Stall 14',
          kind: 'market_stall',
          latitude: -1.29,
          longitude: 36.82,
          stratum: 'North',
          notes: '',
        },
      ],
    });
  });

  it('documents a header line that it accepts as is', () => {
    expect(samplingCsvHeaderLine).toBe(header);
  });

  it('handles a byte-order mark and Windows line ends', () => {
    const text = `\uFEFF${header}\r\nA1,Home,household,10,20,East,\r\nA2,Kiosk,kiosk,11,21,East,\r\n`;
    const result = parseSamplingPointsCsv(text);
    expect(result.ok && result.points.map((p) => p.code)).toEqual(['A1', 'A2']);
  });

  it('accepts headers in another order, case and spacing, and no notes column', () => {
    const text =
      'Latitude,Longitude,Point Code,Point Name,POINT_KIND,Stratum\n5,6,B1,Shop,shop,West';
    const result = parseSamplingPointsCsv(text);
    expect(result.ok && result.points[0]).toMatchObject({ code: 'B1', latitude: 5, notes: '' });
  });

  it('accepts a semicolon-separated file', () => {
    const text = header.replaceAll(',', ';') + '\nC1;Shop;shop;1,5;2;South;';
    // "1,5" is a decimal comma inside a semicolon file: refused, not read as 1 or 15.
    expect(problemsOf(parseSamplingPointsCsv(text))).toEqual([
      { line: 2, column: 'latitude', message: '"1,5" is not a decimal number such as 12.3456.' },
    ]);
    const good = parseSamplingPointsCsv(
      header.replaceAll(',', ';') + '\nC1;Shop;shop;1.5;2;South;',
    );
    expect(good.ok).toBe(true);
  });

  it('names a missing column on the header line', () => {
    const text = 'point_code,point_name,latitude,longitude,stratum\nD1,Shop,1,2,North';
    expect(problemsOf(parseSamplingPointsCsv(text))).toEqual([
      { line: 1, column: 'point_kind', message: 'Missing column; it is required.' },
    ]);
  });

  it('names an unknown column and a column given twice', () => {
    const text = `${header},colour,stratum\nE1,Shop,shop,1,2,North,,red,North`;
    const problems = problemsOf(parseSamplingPointsCsv(text));
    expect(problems.map((p) => [p.line, p.column])).toEqual([
      [1, 'colour'],
      [1, 'stratum'],
    ]);
    expect(problems[0].message).toMatch(/^Unknown column; the columns are point_code, /);
    expect(problems[1].message).toBe('This column appears twice.');
  });

  it('reports every bad cell of every row with its line and column', () => {
    const text = file(
      'F1,Shop,shop,1,2,North,',
      ',Shop,shop,1,2,North,',
      'F3,,shop,123,2,North,',
      'F4,Shop,tent,1,-181,North,',
      'F5,Shop,shop,north,2,,',
    );
    expect(problemsOf(parseSamplingPointsCsv(text))).toEqual([
      { line: 3, column: 'point_code', message: 'Empty — every point needs a code.' },
      { line: 4, column: 'point_name', message: 'Empty — every point needs a name.' },
      { line: 4, column: 'latitude', message: 'Latitude 123 is outside −90 to 90.' },
      {
        line: 5,
        column: 'point_kind',
        message: '"tent" is not a kind; use one of household, shop, market_stall, kiosk, other.',
      },
      { line: 5, column: 'longitude', message: 'Longitude -181 is outside −180 to 180.' },
      { line: 6, column: 'latitude', message: '"north" is not a decimal number such as 12.3456.' },
      { line: 6, column: 'stratum', message: 'Empty — every point needs a stratum or region.' },
    ]);
  });

  it('accepts the boundary coordinates ±90 and ±180', () => {
    const result = parseSamplingPointsCsv(
      file('G1,Pole,other,90,-180,Far,', 'G2,Pole,other,-90,180,Far,'),
    );
    expect(result.ok).toBe(true);
  });

  it('refuses a code used twice, pointing at both lines', () => {
    const text = file(
      'H1,Shop,shop,1,2,North,',
      'H2,Shop,shop,1,2,North,',
      'H1,Other,shop,1,2,North,',
    );
    expect(problemsOf(parseSamplingPointsCsv(text))).toEqual([
      {
        line: 4,
        column: 'point_code',
        message: 'The code "H1" is already used on line 2; codes must be unique.',
      },
    ]);
  });

  it('counts lines through quoted multi-line notes and blank lines', () => {
    const text = file(
      'J1,Shop,shop,1,2,North,"Ask for\nthe owner"',
      '',
      'J2,Shop,shop,99,2,North,',
    );
    expect(problemsOf(parseSamplingPointsCsv(text))).toEqual([
      { line: 5, column: 'latitude', message: 'Latitude 99 is outside −90 to 90.' },
    ]);
  });

  it('refuses a row with a missing or extra separator', () => {
    const text = file('K1,Shop,shop,1,2,North', 'K2,Shop,shop,1,2,North,,extra');
    const problems = problemsOf(parseSamplingPointsCsv(text));
    expect(problems.map((p) => p.line)).toEqual([2, 3]);
    expect(problems[0].message).toBe(
      'This row has 6 cells but the header has 7; check for a missing or extra separator.',
    );
  });

  it('refuses an empty file, a header alone and a quote left open', () => {
    expect(problemsOf(parseSamplingPointsCsv(' \n'))).toEqual([
      { line: 1, column: '', message: 'The file is empty.' },
    ]);
    expect(problemsOf(parseSamplingPointsCsv(`${header}\n`))).toEqual([
      { line: 1, column: '', message: 'The file has a header but no points.' },
    ]);
    const open = file('L1,Shop,shop,1,2,North,ok', 'L2,"Shop,shop,1,2,North,');
    expect(problemsOf(parseSamplingPointsCsv(open))).toEqual([
      { line: 3, column: '', message: 'A quoted cell starting on this line is never closed.' },
    ]);
  });

  it('refuses a file that is not text with one problem and no row checks', () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
    expect(problemsOf(parseSamplingPointsCsv(new TextDecoder().decode(png)))).toEqual([
      {
        line: 1,
        column: '',
        message:
          'This file is not a CSV text file: save the sheet as CSV (comma-separated) and upload that.',
      },
    ]);
  });
});
