import type { ColumnMapping } from '@shared/datasets/dataset-columns';
import type { DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { InDatabaseDemandSpec } from '../estimation/demand/in-database-demand-spec';
import { datasetSchema, datasetTableName } from './dataset-table-name';

/**
 * Turns a dataset fit spec into the in-database demand model over the dataset's table, checking
 * every named column against the mapping: covariates and instruments must be numeric,
 * groupings (fixed effects, clusters) must be grouping columns, weights need a weight column.
 */
export function datasetModelSpec(
  datasetId: string,
  columns: readonly ColumnMapping[],
  spec: DatasetFitSpec,
): InDatabaseDemandSpec {
  const stored = columns.filter((c) => c.role !== 'ignore');
  const byRole = (role: ColumnMapping['role']) => stored.find((c) => c.role === role)?.name;
  const known = stored.map((c) => c.name).join(', ');
  const find = (name: string, field: string, want: 'number' | 'grouping') => {
    const column = stored.find((c) => c.name === name);
    if (!column) {
      throw new EstimationError(
        'missing-column',
        `the dataset has no column ${name} (its columns: ${known})`,
        field,
      );
    }
    if (want === 'number' && column.type !== 'number') {
      throw new EstimationError(
        'invalid-value',
        `column ${name} holds ${column.type} values, not numbers`,
        field,
      );
    }
    if (want === 'grouping' && column.role !== 'grouping') {
      throw new EstimationError(
        'invalid-value',
        `column ${name} is not a grouping column (it is ${column.role})`,
        field,
      );
    }
    if (want === 'number' && (column.role === 'price' || column.role === 'quantity')) {
      throw new EstimationError(
        'duplicate-column',
        `column ${name} is the ${column.role} already in the model`,
        field,
      );
    }
    return name;
  };
  const weight = byRole('weight');
  if (spec.weighted && !weight) {
    throw new EstimationError(
      'missing-column',
      'the dataset has no column mapped as weight',
      'weighted',
    );
  }
  return {
    source: { schema: datasetSchema, name: datasetTableName(datasetId) },
    form: spec.form,
    quantity: byRole('quantity')!,
    price: byRole('price')!,
    covariates: spec.covariates.map((c, i) => ({
      column: find(c.column, `covariates.${i}.column`, 'number'),
      role: c.role,
    })),
    fixedEffects: spec.fixedEffects.map((c, i) => find(c, `fixedEffects.${i}`, 'grouping')),
    weights: spec.weighted ? weight : undefined,
    standardErrors:
      spec.standardErrors.type === 'cluster'
        ? {
            type: 'cluster',
            column: find(spec.standardErrors.column, 'standardErrors.column', 'grouping'),
          }
        : spec.standardErrors,
    instruments: spec.instruments.map((c, i) => {
      if (c === byRole('price')) {
        throw new EstimationError(
          'instrument-is-price',
          `instrument ${c} is the price itself; an instrument must be another column that moves the price`,
          `instruments.${i}`,
        );
      }
      return find(c, `instruments.${i}`, 'number');
    }),
    confidenceLevel: spec.confidenceLevel,
    lineColumn: 'line',
  };
}
