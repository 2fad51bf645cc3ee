/**
 * How the PDF report writes a number: four significant digits, plain digits (no exponent, no
 * grouping), a hyphen-minus for negatives; empty for a missing value.
 */
export function reportNumber(value: number | null): string {
  if (value === null) return '';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e4) return String(Math.round(value));
  const digits = Math.max(0, 3 - Math.floor(Math.log10(magnitude)));
  return String(Number(value.toFixed(Math.min(digits, 8))));
}
