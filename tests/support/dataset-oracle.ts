import { sql } from 'drizzle-orm';
import type { DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import type { DemandFit } from '@shared/estimation/least-squares/demand-fit';
import type { DemandModelSpec } from '@shared/estimation/least-squares/demand-model-spec';
import { fitDemandModel } from '@shared/estimation/least-squares/fit-demand-model';
import type { Database } from '../../server/db/database';
import { datasetSchema, datasetTableName } from '../../server/datasets/dataset-table-name';

/**
 * The in-memory path as the oracle: the dataset's rows read into Node (file order) and fitted
 * by fitDemandModel with the same model.
 */
export async function inMemoryDatasetFit(
  db: Database,
  datasetId: string,
  names: { quantity: string; price: string; weight?: string },
  spec: DatasetFitSpec,
): Promise<DemandFit> {
  const table = sql`${sql.identifier(datasetSchema)}.${sql.identifier(datasetTableName(datasetId))}`;
  const rows = (await db.execute(sql`SELECT * FROM ${table} ORDER BY line`)).rows;
  const numbers = (name: string) => ({ name, values: rows.map((r) => Number(r[name])) });
  const labels = (name: string) => ({ name, values: rows.map((r) => String(r[name])) });
  const model: DemandModelSpec = {
    form: spec.form,
    quantity: numbers(names.quantity),
    price: numbers(names.price),
    covariates: spec.covariates.map((c) => ({ ...numbers(c.column), role: c.role })),
    fixedEffects: spec.fixedEffects.map(labels),
    weights: spec.weighted && names.weight ? numbers(names.weight) : undefined,
    standardErrors:
      spec.standardErrors.type === 'cluster'
        ? { type: 'cluster', clusters: labels(spec.standardErrors.column) }
        : spec.standardErrors,
    confidenceLevel: spec.confidenceLevel,
    instruments: spec.instruments.length ? spec.instruments.map(numbers) : undefined,
  };
  return fitDemandModel(model);
}

/** |a − b| ≤ tolerance·max(|a|, |b|): agreement to a relative tolerance. */
export function relativeGap(a: number, b: number): number {
  if (a === b) return 0;
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
}

/** Every figure a demand fit reports, by name, for comparing two fits. */
export function fitFigures(fit: DemandFit): Map<string, number> {
  const figures = new Map<string, number>();
  for (const row of fit.coefficients) {
    figures.set(`${row.term} estimate`, row.estimate);
    figures.set(`${row.term} SE`, row.stdError);
    figures.set(`${row.term} CI low`, row.ciLow);
    figures.set(`${row.term} CI high`, row.ciHigh);
  }
  for (const e of fit.elasticities) {
    figures.set(`${e.term} elasticity`, e.estimate);
    figures.set(`${e.term} elasticity SE`, e.stdError);
  }
  figures.set('R²', fit.rSquared);
  figures.set('adjusted R²', fit.adjustedRSquared);
  figures.set('residual SD', fit.residualSD);
  figures.set('n', fit.n);
  figures.set('df', fit.standardErrors.df);
  if (fit.fStatistic !== null) figures.set('F', fit.fStatistic);
  for (const stage of fit.firstStages ?? []) {
    if (stage.fStatistic !== null)
      figures.set(`first-stage F ${stage.endogenous}`, stage.fStatistic);
  }
  return figures;
}
