import type { BidDesign, BidLevel } from './bid-design';

/**
 * The bid for the `respondentIndexAtSite`-th respondent (0, 1, 2…) at one site.
 *
 * Bids rotate through the design, so any run of consecutive respondents at a site uses each
 * bid equally often (within one). The rotation starts at an offset taken from a stable hash of
 * the site, so that sites with few respondents do not all get the lowest bids, and the same
 * site and index give the same bid on every device and on the server.
 *
 * @throws RangeError when the design has no bids or the index is not a whole number ≥ 0.
 */
export function assignBid(
  design: BidDesign,
  siteKey: string,
  respondentIndexAtSite: number,
): BidLevel {
  const count = design.levels.length;
  if (count === 0) throw new RangeError('The bid design has no bids to assign');
  if (!Number.isSafeInteger(respondentIndexAtSite) || respondentIndexAtSite < 0) {
    throw new RangeError(
      `The respondent index at a site must be a whole number ≥ 0, not ${respondentIndexAtSite}`,
    );
  }
  const offset = stableSiteHash(siteKey) % count;
  return design.levels[(offset + respondentIndexAtSite) % count];
}

/**
 * 32-bit FNV-1a over the UTF-16 code units of the key: fast, stable across platforms, and
 * spread well enough for picking a starting bid. Not for anything secret.
 */
export function stableSiteHash(siteKey: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < siteKey.length; i++) {
    hash ^= siteKey.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash >>> 0;
}
