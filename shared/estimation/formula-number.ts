const minus = '\u2212';

/**
 * A number as a formula shown to people writes it: `digits` significant digits (trailing zeros
 * dropped), a true minus sign, and a power of ten instead of an exponent for very small or very
 * large magnitudes. Engine values carry 16 digits that no reader can use.
 */
export function formulaNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return String(value);
  const rounded = Number(value.toPrecision(digits));
  const magnitude = Math.abs(rounded);
  const text =
    magnitude !== 0 && (magnitude < 1e-4 || magnitude >= 1e9)
      ? rounded
          .toExponential(digits - 1)
          .replace(/\.?0+e/, 'e')
          .replace(/e\+?(-?)(\d+)$/, (_, sign: string, power: string) => `×10^${sign}${power}`)
      : String(rounded);
  return text.replace(/-/g, minus);
}

/** A term that follows another in a formula: "+ 0.5" or "− 0.5", the sign spaced like an operator. */
export function formulaTerm(value: number, digits = 4): string {
  const sign = value < 0 ? minus : '+';
  return `${sign} ${formulaNumber(Math.abs(value), digits)}`;
}
