import type { EstimatedFigure } from '@shared/analysis/estimated-figure';

/** The kinds of number the analysis screens show, each with its own way of writing. */
export type FigureUnit = 'price' | 'share' | 'quantity' | 'elasticity' | 'index' | 'count';

/**
 * Writes figures for one study: prices in its currency and locale, shares as percentages,
 * elasticities to two decimals, quantities to four significant digits; negative numbers with a
 * true minus sign.
 */
export class FigureFormat {
  private readonly formats: Record<FigureUnit, Intl.NumberFormat>;

  constructor(
    readonly currency: string,
    readonly locale: string,
  ) {
    // 'negative': a value that rounds to zero is written 0, never a signed zero.
    // 'negative': a value that rounds to zero is written 0, never a signed zero. (The option is
    // newer than TypeScript's lib typings, as is trailingZeroDisplay below.)
    const plain = (options: Intl.NumberFormatOptions) =>
      new Intl.NumberFormat(locale, {
        signDisplay: 'negative',
        ...options,
      } as Intl.NumberFormatOptions);
    this.formats = {
      // Whole amounts without ".00": schedules are mostly on round prices.
      price: plain({
        style: 'currency',
        currency,
        maximumFractionDigits: 2,
        trailingZeroDisplay: 'stripIfInteger',
      } as Intl.NumberFormatOptions),
      share: plain({ style: 'percent', maximumFractionDigits: 1 }),
      quantity: plain({ maximumSignificantDigits: 4 }),
      elasticity: plain({ minimumFractionDigits: 2, maximumFractionDigits: 2 }),
      index: plain({ maximumSignificantDigits: 4 }),
      count: plain({ maximumFractionDigits: 0 }),
    };
  }

  /** One number; a dash for a missing one. */
  value(value: number | null | undefined, unit: FigureUnit): string {
    if (value === null || value === undefined || !Number.isFinite(value)) return '–';
    // Most locales write a hyphen-minus; the screens write a true minus sign (U+2212), the
    // same as in formulas, so a negative figure never reads as a dash or a range.
    return this.formats[unit]
      .formatToParts(value)
      .map((part) => (part.type === 'minusSign' ? '\u2212' : part.value))
      .join('');
  }

  /** "low to high", or null when there is no interval. */
  interval(low: number | null, high: number | null, unit: FigureUnit): string | null {
    if (low === null || high === null) return null;
    return `${this.value(low, unit)} to ${this.value(high, unit)}`;
  }

  /** "12.30 (95 % interval 11.10 to 13.90)" for reading aloud and for tables. */
  figure(figure: EstimatedFigure, unit: FigureUnit, confidenceLevel: number): string {
    const interval = this.interval(figure.low, figure.high, unit);
    const value = this.value(figure.estimate, unit);
    return interval ? `${value} (${levelLabel(confidenceLevel)} interval ${interval})` : value;
  }
}

/** "95 %" for 0.95. */
export function levelLabel(confidenceLevel: number): string {
  return `${Math.round(confidenceLevel * 1000) / 10} %`;
}
