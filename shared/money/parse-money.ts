import { minorUnitDigits } from './minor-unit-digits';

/** The result of reading a typed amount: the integer minor units, or why it cannot be read. */
export type MoneyParse = { ok: true; minor: number } | { ok: false; message: string };

const spaces = /[\s\u00a0\u202f]/g;

/**
 * Reads an amount a person typed ("1,250.50", "1 250,50", "12") into integer minor units of
 * `currency`, using the decimal and group separators of `locale`. A point is also accepted as
 * the decimal separator where the locale groups with something else. Group separators must
 * stand between groups of three digits, so "12,50" typed in an English locale is refused
 * rather than read as 1250. Negative amounts, signs and currency symbols are refused.
 */
export function parseMoney(text: string, currency: string, locale = 'en'): MoneyParse {
  const digits = minorUnitDigits(currency);
  const separators = separatorsOf(locale);
  const { decimal, group } = separators;
  const compact = text.replace(spaces, '');
  if (compact === '') return { ok: false, message: 'Enter an amount' };
  const decimalMarks = decimal === '.' || group === '.' ? [decimal] : [decimal, '.'];
  const split = splitAtDecimal(compact, decimalMarks);
  if (!split) return { ok: false, message: `"${text}" has more than one decimal separator` };
  const whole = readWholePart(split.whole, separators);
  if (whole === null || !/^\d*$/.test(split.fraction) || (whole === '' && split.fraction === '')) {
    return {
      ok: false,
      message: `"${text}" is not an amount; type digits, e.g. ${example(digits, decimal)}`,
    };
  }
  if (split.fraction.length > digits) {
    return {
      ok: false,
      message:
        digits === 0
          ? `${currency} amounts have no decimals`
          : `${currency} amounts have at most ${digits} decimal places`,
    };
  }
  const minor = Number((whole || '0') + split.fraction.padEnd(digits, '0'));
  if (!Number.isSafeInteger(minor)) return { ok: false, message: `"${text}" is too large` };
  return { ok: true, minor };
}

interface Separators {
  decimal: string;
  group: string;
  /** Digits between group separators above the thousands (3, or 2 in Indian grouping). */
  upperGroupSize: number;
}

function separatorsOf(locale: string): Separators {
  const parts = new Intl.NumberFormat(locale).formatToParts(1234567.5);
  const find = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  const integers = parts.filter((p) => p.type === 'integer').map((p) => p.value);
  return {
    decimal: find('decimal') || '.',
    group: find('group').replace(spaces, ''),
    upperGroupSize: integers.length > 2 ? integers[1].length : 3,
  };
}

function splitAtDecimal(text: string, marks: string[]): { whole: string; fraction: string } | null {
  const positions = [...text].flatMap((char, i) => (marks.includes(char) ? [i] : []));
  if (positions.length > 1) return null;
  if (positions.length === 0) return { whole: text, fraction: '' };
  return { whole: text.slice(0, positions[0]), fraction: text.slice(positions[0] + 1) };
}

/** The digits of the whole part with well-placed group separators removed, or null. */
function readWholePart(whole: string, { group, upperGroupSize }: Separators): string | null {
  if (/^\d*$/.test(whole)) return whole;
  if (group === '' || !whole.includes(group)) return null;
  const groups = whole.split(group);
  const last = groups.length - 1;
  const upper = new RegExp(`^\\d{${upperGroupSize}}$`);
  const wellPlaced =
    new RegExp(`^\\d{1,${upperGroupSize}}$`).test(groups[0]) &&
    /^\d{3}$/.test(groups[last]) &&
    groups.slice(1, last).every((part) => upper.test(part));
  return wellPlaced ? groups.join('') : null;
}

function example(digits: number, decimal: string): string {
  return digits === 0 ? '1500' : `12${decimal}${'5'.padEnd(digits, '0')}`;
}
