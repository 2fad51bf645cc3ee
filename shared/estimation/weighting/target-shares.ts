import { EstimationError } from '../estimation-error';

/**
 * Population targets for one variable as shares summing to 1. Accepts shares or population
 * totals (anything positive); refuses a negative, NaN or all-zero target.
 */
export function normaliseTargets(
  targets: Readonly<Record<string, number>>,
  field: string,
): Map<string, number> {
  const entries = Object.entries(targets);
  for (const [level, value] of entries) {
    if (!(Number.isFinite(value) && value >= 0)) {
      throw new EstimationError(
        'invalid-value',
        `target for ${field} = ${level} must be a number ≥ 0`,
        field,
      );
    }
  }
  const total = entries.reduce((s, [, v]) => s + v, 0);
  if (!(total > 0))
    throw new EstimationError('invalid-value', `targets for ${field} sum to 0`, field);
  return new Map(entries.map(([level, value]) => [level, value / total]));
}

/** Refuses sample levels without a target and targets without any respondent. */
export function checkLevels(
  levels: readonly string[],
  targets: Map<string, number>,
  field: string,
): void {
  const seen = new Set(levels);
  for (const level of seen) {
    if (!targets.has(level)) {
      throw new EstimationError(
        'missing-target',
        `${field} = ${level} appears in the sample but has no target`,
        field,
      );
    }
  }
  for (const [level, share] of targets) {
    if (share > 0 && !seen.has(level)) {
      throw new EstimationError(
        'empty-cell',
        `${field} = ${level} has a target but no respondent`,
        field,
      );
    }
  }
}
