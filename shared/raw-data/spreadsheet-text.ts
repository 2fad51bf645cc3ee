/**
 * Characters that make a spreadsheet read a cell as a formula (or, for tab and carriage return,
 * move the cell). Common practice for exported text: prefix such a cell with an apostrophe, which
 * spreadsheets show as text and never evaluate.
 */
const formulaStart = /^[=+\-@\t\r]/;

/** Text made safe to open in a spreadsheet: starts that would run as a formula get a `'`. */
export function neutraliseFormula(text: string): string {
  return formulaStart.test(text) ? `'${text}` : text;
}
