import { EstimationError } from '@shared/estimation/estimation-error';
import type { StandardErrorSpec } from '@shared/estimation/least-squares/coefficient-covariance';
import type { DemandForm } from '@shared/estimation/least-squares/demand-model-spec';
import type { NamedColumn } from '@shared/estimation/least-squares/named-column';
import type { DataTable } from '../data-table';
import type { MethodOptions } from './survey-options';

// Readers of the ols method's command-line options; each refusal names the option.

/** --se classical|hc1|cluster:COLUMN. */
export function standardErrorsOption(table: DataTable, options: MethodOptions): StandardErrorSpec {
  const se = optionalText(options, 'se') ?? 'classical';
  if (se === 'classical' || se === 'hc1') return { type: se };
  const match = /^cluster:(.+)$/.exec(se);
  if (!match)
    throw new EstimationError(
      'invalid-option',
      '--se must be classical, hc1 or cluster:COLUMN',
      'se',
    );
  return { type: 'cluster', clusters: { name: match[1], values: table.texts(match[1]) } };
}

/** --form linear|loglog|semilog. */
export function demandForm(value: string | boolean): DemandForm {
  if (value === 'linear' || value === 'loglog' || value === 'semilog') return value;
  throw new EstimationError('invalid-option', '--form must be linear, loglog or semilog', 'form');
}

/** A numeric column of the table, named. */
export function column(table: DataTable, name: string): NamedColumn {
  return { name, values: table.numbers(name) };
}

/** A text option, or undefined when absent; refuses an empty value. */
export function optionalText(options: MethodOptions, name: string): string | undefined {
  const value = options[name];
  if (value === undefined) return undefined;
  if (typeof value !== 'string' || value.trim() === '') {
    throw new EstimationError('invalid-option', `--${name} needs a value`, name);
  }
  return value.trim();
}

/** A text option that must be present. */
export function requiredText(options: MethodOptions, name: string): string {
  const value = optionalText(options, name);
  if (value === undefined) throw new EstimationError('invalid-option', `ols needs --${name}`, name);
  return value;
}

/** A comma-separated list of column names (empty when absent). */
export function optionalList(options: MethodOptions, name: string): string[] {
  const value = optionalText(options, name);
  return value === undefined
    ? []
    : value
        .split(',')
        .map((part) => part.trim())
        .filter(Boolean);
}

/** A comma-separated list that must name at least one column. */
export function requiredList(options: MethodOptions, name: string): string[] {
  requiredText(options, name);
  const list = optionalList(options, name);
  if (list.length === 0) {
    throw new EstimationError('invalid-option', `--${name} needs at least one column`, name);
  }
  return list;
}
