import { z } from 'zod';

/** The kinds of place an enumerator visits. */
export const samplingPointKinds = ['household', 'shop', 'market_stall', 'kiosk', 'other'] as const;

export const samplingPointKindSchema = z.enum(samplingPointKinds);
export type SamplingPointKind = z.infer<typeof samplingPointKindSchema>;

/** Human labels used by every screen. */
export const samplingPointKindLabels: Readonly<Record<SamplingPointKind, string>> = {
  household: 'Household',
  shop: 'Shop',
  market_stall: 'Market stall',
  kiosk: 'Kiosk',
  other: 'Other',
};

/**
 * Reads a kind as people type it in a spreadsheet: case, spaces and hyphens do not matter, so
 * `Market stall`, `market-stall` and `market_stall` are the same kind.
 */
export function normaliseKind(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
}
