import { EstimationError } from '../estimation-error';
import { checkLabelColumn, type LabelColumn, type NamedColumn } from './named-column';

/** A categorical column entered as fixed effects (one 0/1 dummy per level). */
export interface FixedEffectSpec extends LabelColumn {
  /** The level left out as the reference (default: the first level in natural sort order). */
  readonly base?: string;
}

/** The dummies for one fixed-effect column. */
export interface FixedEffectColumns {
  readonly columns: NamedColumn[];
  /** The level without a dummy, or null when every level has one. */
  readonly base: string | null;
  readonly levels: readonly string[];
}

/**
 * Dummy columns named `column=level`. With an intercept the base level is dropped (its effect
 * is the intercept); without one every level keeps its dummy.
 */
export function fixedEffectColumns(
  spec: FixedEffectSpec,
  n: number,
  dropBase: boolean,
): FixedEffectColumns {
  checkLabelColumn(spec, n);
  const labels = spec.values.map(String);
  const levels = [...new Set(labels)].sort((a, b) =>
    a.localeCompare(b, undefined, { numeric: true }),
  );
  if (spec.base !== undefined && !levels.includes(spec.base)) {
    throw new EstimationError(
      'invalid-option',
      `base level ${spec.base} does not occur in column ${spec.name} (levels: ${levels.join(', ')})`,
      spec.name,
    );
  }
  const base = dropBase ? (spec.base ?? levels[0]) : null;
  const columns = levels
    .filter((level) => level !== base)
    .map((level) => ({
      name: `${spec.name}=${level}`,
      values: labels.map((label) => (label === level ? 1 : 0)),
    }));
  return { columns, base, levels };
}
