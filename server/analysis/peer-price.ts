import type { AnalysisDataset, ObservedRow } from './analysis-dataset';

/**
 * Adds the peer-price instrument: for each observation, the mean price observed at the other
 * sampling points of the same region. Prices at other shops share the region's supply costs but
 * not the own shop's demand shock (a Hausman-type instrument; the assumption is the researcher's
 * to defend). Observations with no other point in their region are left out, and counted.
 */
export function withPeerPrices(
  dataset: AnalysisDataset<'observed-prices'>,
): AnalysisDataset<'observed-prices'> {
  const kept: ObservedRow[] = [];
  let without = 0;
  for (const row of dataset.rows) {
    const peers = dataset.rows.filter(
      (other) => other.region === row.region && other.pointId !== row.pointId,
    );
    if (row.region === null || row.pointId === null || peers.length === 0) {
      without++;
      continue;
    }
    const peerPrice = peers.reduce((sum, other) => sum + other.price, 0) / peers.length;
    kept.push({ ...row, peerPrice });
  }
  const reason = 'no other sampling point in its region (peer-price instrument)';
  return {
    ...dataset,
    rows: kept,
    skipped: without > 0 ? [...dataset.skipped, { reason, count: without }] : dataset.skipped,
  };
}
