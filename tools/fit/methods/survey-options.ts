import { buildDemandSchedule } from '@shared/estimation/demand-schedule/demand-schedule';
import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { DataTable } from '../data-table';

/** Command-line options as the fit command passes them. */
export type MethodOptions = Record<string, string | boolean>;

/** A numeric option, or the fallback when absent; refuses text that is not a number. */
export function numberOption(
  options: MethodOptions,
  name: string,
  fallback?: number,
): number | undefined {
  const raw = options[name];
  if (raw === undefined) return fallback;
  const value = typeof raw === 'string' ? Number(raw) : NaN;
  if (typeof raw !== 'string' || raw.trim() === '' || !Number.isFinite(value)) {
    throw new EstimationError('invalid-option', `--${name} needs a number`, name);
  }
  return value;
}

/** A text option restricted to the given choices. */
export function choiceOption<const T extends string>(
  options: MethodOptions,
  name: string,
  choices: readonly T[],
  fallback: NoInfer<T>,
): T {
  const raw = options[name];
  if (raw === undefined) return fallback;
  if (typeof raw !== 'string' || !choices.includes(raw as T)) {
    throw new EstimationError(
      'invalid-option',
      `--${name} must be one of ${choices.join(', ')}`,
      name,
    );
  }
  return raw as T;
}

/** "5:0.7,4:0.5,3:0.3,2:0.1,1:0" → a calibration of the five levels. */
export function calibrationOption(
  options: MethodOptions,
): Record<1 | 2 | 3 | 4 | 5, number> | undefined {
  const raw = options['calibration'];
  if (raw === undefined) return undefined;
  const pairs = typeof raw === 'string' ? raw.split(',').map((p) => p.split(':').map(Number)) : [];
  const map: Record<number, number> = Object.fromEntries(pairs.map(([k, v]) => [k, v]));
  if (pairs.length !== 5 || ![1, 2, 3, 4, 5].every((k) => Number.isFinite(map[k]))) {
    throw new EstimationError(
      'invalid-option',
      '--calibration needs five level:probability pairs, e.g. 5:0.7,4:0.5,3:0.3,2:0.1,1:0',
      'calibration',
    );
  }
  return map as Record<1 | 2 | 3 | 4 | 5, number>;
}

/** Weights column named by --weights, if any. */
export function weightsOption(table: DataTable, options: MethodOptions): number[] | undefined {
  const column = options['weights'];
  return typeof column === 'string' ? table.numbers(column) : undefined;
}

/** Reads a yes/no column: yes/no, y/n, true/false or 1/0 (any case). */
export function yesNoColumn(table: DataTable, column: string): boolean[] {
  return table.texts(column).map((cell, i) => {
    const v = cell.trim().toLowerCase();
    if (['yes', 'y', 'true', '1'].includes(v)) return true;
    if (['no', 'n', 'false', '0'].includes(v)) return false;
    throw new EstimationError(
      'invalid-value',
      `column ${column}, row ${i + 1}: "${cell}" is not yes or no`,
      column,
    );
  });
}

/** With --grid FROM:TO:STEPS, the demand schedule of the fitted curve over that grid. */
export function scheduleOption(
  curve: FittedDemandCurve,
  options: MethodOptions,
  level: number,
): Record<string, unknown> {
  const raw = options['grid'];
  if (raw === undefined) return {};
  const [from, to, steps] = typeof raw === 'string' ? raw.split(':').map(Number) : [];
  return { demandSchedule: buildDemandSchedule(curve, { from, to, steps }, level) };
}
