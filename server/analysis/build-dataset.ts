import type { AnalysisMethod } from '@shared/analysis/analysis-method';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { AnalysisDataset, RowsByMethod } from './analysis-dataset';
import type { AnalysisInterview } from './analysis-interview';
import { extractObserved } from './extract/extract-observed';
import {
  extractBid,
  extractCard,
  extractLadder,
  extractThresholds,
  extractWtpOpen,
} from './extract/extract-stated';
import type { Extraction } from './extract/extraction';
import { withPeerPrices } from './peer-price';
import { respondentProfile, type RespondentProfile } from './respondent-profile';

/**
 * Turns the matched interviews into the rows of the spec's method, in interview-id order,
 * counting every interview left out by its reason; `digits` converts minor to major units.
 */
export function buildDataset(
  interviews: readonly AnalysisInterview[],
  spec: FitSpec,
  digits: number,
): AnalysisDataset {
  const sorted = [...interviews].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const rows: RowsByMethod[AnalysisMethod][] = [];
  const skipped = new Map<string, number>();
  const blockIds = new Set<string>();
  const design = new Set<number>();
  const bounds = new Set<'single' | 'double'>();
  const profiles = new Map<string, RespondentProfile>();
  for (const interview of sorted) {
    const profile = respondentProfile(interview, digits);
    const found = extract(interview, spec, digits, profile);
    if ('skip' in found) {
      skipped.set(found.skip, (skipped.get(found.skip) ?? 0) + 1);
      continue;
    }
    rows.push(...found.rows);
    profiles.set(interview.id, profile);
    blockIds.add(found.blockId);
    found.design?.forEach((level) => design.add(level));
    if (found.bounds) bounds.add(found.bounds);
  }
  if (bounds.size > 1) {
    throw new EstimationError(
      'invalid-value',
      'the dichotomous-choice blocks of these interviews mix single and double bounds; choose one block',
      'blockId',
    );
  }
  const dataset: AnalysisDataset = {
    method: spec.method,
    rows,
    blockIds: [...blockIds].sort(),
    designLevels: design.size > 0 ? [...design].sort((a, b) => a - b) : null,
    bounds: bounds.size === 1 ? [...bounds][0] : null,
    profiles,
    interviewsMatched: interviews.length,
    skipped: [...skipped].map(([reason, count]) => ({ reason, count })),
  };
  return spec.method === 'observed-prices' && spec.instrument === 'peer-price'
    ? withPeerPrices(dataset as AnalysisDataset<'observed-prices'>)
    : dataset;
}

function extract(
  interview: AnalysisInterview,
  spec: FitSpec,
  digits: number,
  profile: RespondentProfile,
): Extraction<RowsByMethod[AnalysisMethod]> {
  switch (spec.method) {
    case 'observed-prices':
      return extractObserved(interview, spec, digits, profile);
    case 'price-ladder':
      return extractLadder(interview, spec.blockId, digits);
    case 'price-thresholds':
      return extractThresholds(interview, spec.blockId, digits);
    case 'wtp-open':
      return extractWtpOpen(interview, spec.blockId, digits);
    case 'payment-card':
      return extractCard(interview, spec.blockId, digits);
    case 'dichotomous-choice':
      return extractBid(interview, spec.blockId, digits);
  }
}
