import type { FitResult } from '@shared/analysis/fit-result';
import type { FitSpec } from '@shared/analysis/fit-spec';

/** Shelf data records one shop's shelf per visit: those interviews asked nobody anything. */
const countsShelves = (spec: FitSpec) =>
  spec.method === 'observed-prices' && spec.source === 'shelf';

/** A fit's n with what it counts: "72 respondents", or "72 shelf observations" for shelf data. */
export function sampleCount(spec: FitSpec, n: number): string {
  const [one, many] = countsShelves(spec)
    ? ['shelf observation', 'shelf observations']
    : ['respondent', 'respondents'];
  return `${n} ${n === 1 ? one : many}`;
}

/**
 * The sample line of a fit's results. The estimator's rows are named only when they differ from
 * n: with shelf data each row is one shelf observation, and "72 … · 72 observations" says nothing.
 */
export function sampleSizeText(spec: FitSpec, result: Pick<FitResult, 'n' | 'observations'>) {
  const n = `n = ${sampleCount(spec, result.n)}`;
  if (countsShelves(spec) && result.observations === result.n) return n;
  return `${n} · ${result.observations} observations`;
}
