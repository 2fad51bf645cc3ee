/** Puts the dashes of a UUID back into 32 hex digits. */
function dashed(hex: string): string {
  return [
    hex.slice(0, 8),
    hex.slice(8, 12),
    hex.slice(12, 16),
    hex.slice(16, 20),
    hex.slice(20, 32),
  ].join('-');
}

/**
 * The ids an interview reference (leading hex digits of the id, dashes removed) can stand for,
 * as the lowest and highest UUID with that prefix, so a search is a range on the id's index
 * rather than a text match over every row.
 */
export function referenceIdRange(referenceHex: string): { lowest: string; highest: string } {
  return {
    lowest: dashed(referenceHex.padEnd(32, '0')),
    highest: dashed(referenceHex.padEnd(32, 'f')),
  };
}
