import { neutraliseFormula } from './spreadsheet-text';

describe('neutraliseFormula', () => {
  it.each(['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\tx', '\rx'])('prefixes %j', (text) => {
    expect(neutraliseFormula(text)).toBe(`'${text}`);
  });

  it.each(['plain', '1=1', ' =x', '', "'already"])('leaves %j as it is', (text) => {
    expect(neutraliseFormula(text)).toBe(text);
  });
});
