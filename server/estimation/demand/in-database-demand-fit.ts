import { sql, type SQL } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { DemandDesign, DemandTerm } from '@shared/estimation/least-squares/demand-design';
import { demandElasticities } from '@shared/estimation/least-squares/demand-elasticities';
import type { DemandFit } from '@shared/estimation/least-squares/demand-fit';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import type { FitDatabase, SqlRunner } from '../in-database-model-spec';
import { fitInDatabase } from '../in-database-least-squares';
import {
  checkAndAverage,
  fixedEffectLevels,
  type ColumnMeans,
  type ContinuousColumn,
} from './demand-checks';
import type { InDatabaseDemandSpec } from './in-database-demand-spec';
import { twoStageInDatabase } from './two-stage-in-database';

/** A demand fit made in the database, with the means its curve is drawn at. */
export interface InDatabaseDemandFit {
  readonly fit: DemandFit;
  /** (Weighted) means of the transformed regressors, by term name. */
  readonly regressorMeans: Record<string, number>;
  readonly fixedEffectMethod: 'dummies';
}

/** A fixed-effect dummy: its term name `column=level`, and where it comes from. */
export interface DummyColumn {
  readonly name: string;
  readonly column: string;
  readonly level: string;
}

/**
 * Fits a demand curve (linear, log-log or semi-log) on a stored table without moving its rows:
 * a checking scan (empty or non-positive values by line, price variation, the means), then the
 * in-database least-squares engine — one aggregate pass and an exact solve, a residual pass for
 * HC1 or clustered errors — on a source query that applies the form's logs and the fixed
 * effects' dummies in SQL. With instruments the fit is two-stage least squares (see
 * twoStageInDatabase). Gives the same DemandFit as fitDemandModel on the same rows.
 */
export async function fitDemandInDatabase(
  db: FitDatabase & SqlRunner,
  spec: InDatabaseDemandSpec,
): Promise<InDatabaseDemandFit> {
  checkSpec(spec);
  const table =
    'query' in spec.source
      ? sql`(${spec.source.query}) AS src`
      : sql`${sql.identifier(spec.source.schema)}.${sql.identifier(spec.source.name)} AS src`;
  const logged = spec.form === 'loglog';
  const continuous: ContinuousColumn[] = [
    { column: spec.price, logged },
    ...spec.covariates.map((c) => ({ column: c.column, logged })),
  ];
  const levels = await fixedEffectLevels(db, table, spec);
  const dummies: DummyColumn[] = [...levels].flatMap(([column, values]) =>
    values.slice(1).map((level) => ({ name: `${column}=${level}`, column, level })),
  );
  const means = await checkAndAverage(db, table, spec, continuous, dummies);
  const source = sourceQuery(table, spec, continuous, dummies);
  const exogenous = [...spec.covariates.map((c) => c.column), ...dummies.map((d) => d.name)];
  const standardErrors =
    spec.standardErrors.type === 'cluster'
      ? { type: 'cluster' as const, column: '__cluster' }
      : spec.standardErrors;
  const base = {
    response: spec.quantity,
    weights: spec.weights ? '__weight' : undefined,
    standardErrors,
    confidenceLevel: spec.confidenceLevel,
  };
  const linear =
    spec.instruments.length > 0
      ? await twoStageInDatabase(db, source, base, {
          exogenous,
          endogenous: spec.price,
          instruments: spec.instruments,
        })
      : await fitInDatabase(db, {
          ...base,
          source: { query: source },
          regressors: [spec.price, ...exogenous],
        });
  const fit = withClusterName(linear, spec);
  const design = designAtMeans(spec, continuous, dummies, means);
  const elasticities = demandElasticities(design, fit, undefined, {});
  const bases: Record<string, string | null> = {};
  for (const [column, values] of levels) bases[column] = values[0];
  return {
    fit: {
      ...fit,
      form: spec.form,
      loggedColumns: [...design.loggedColumns],
      fixedEffectBases: bases,
      elasticities,
      assumptions: [
        ...fit.assumptions,
        ...[...levels.keys()].map(
          (column) => `fixed effects for ${column} as dummies, base level ${bases[column]}`,
        ),
        `columns entered as natural logarithms: ${design.loggedColumns.join(', ') || 'none'}`,
        'elasticities are evaluated at the (weighted) means of the columns',
      ],
    },
    regressorMeans: Object.fromEntries(means.transformed),
    fixedEffectMethod: 'dummies',
  };
}

/** The engine clusters on an alias; the report names the grouping the researcher chose. */
function withClusterName(fit: LinearFit, spec: InDatabaseDemandSpec): LinearFit {
  if (spec.standardErrors.type !== 'cluster') return fit;
  return {
    ...fit,
    standardErrors: { ...fit.standardErrors, clusterColumn: spec.standardErrors.column },
  };
}

function checkSpec(spec: InDatabaseDemandSpec): void {
  if (spec.instruments.includes(spec.price)) {
    throw new EstimationError(
      'instrument-is-price',
      `the price ${spec.price} cannot instrument itself; choose another column`,
      'instruments',
    );
  }
  const model = [spec.quantity, spec.price, ...spec.covariates.map((c) => c.column)];
  const repeated = model.find((column, i) => model.indexOf(column) !== i);
  if (repeated !== undefined) {
    throw new EstimationError(
      'duplicate-column',
      `${repeated} appears twice in the model`,
      'covariates',
    );
  }
}

/**
 * SELECT of the model's columns as the fit reads them: the response and continuous regressors
 * (logged as the form says) under their own names, the instruments, one 0/1 dummy per
 * non-base level, the weights and the cluster ids.
 */
function sourceQuery(
  table: SQL,
  spec: InDatabaseDemandSpec,
  continuous: readonly ContinuousColumn[],
  dummies: readonly DummyColumn[],
): SQL {
  const value = (column: string, logged: boolean) => {
    const stored = sql`src.${sql.identifier(column)}::float8`;
    return logged ? sql`ln(${stored})` : stored;
  };
  const columns: SQL[] = [
    sql`${value(spec.quantity, spec.form !== 'linear')} AS ${sql.identifier(spec.quantity)}`,
    ...continuous.map((c) => sql`${value(c.column, c.logged)} AS ${sql.identifier(c.column)}`),
    ...spec.instruments.map(
      (column) => sql`${value(column, spec.form === 'loglog')} AS ${sql.identifier(column)}`,
    ),
    ...dummies.map(
      (d) =>
        sql`(CASE WHEN src.${sql.identifier(d.column)}::text = ${d.level} THEN 1 ELSE 0 END)::float8 AS ${sql.identifier(d.name)}`,
    ),
  ];
  if (spec.weights) columns.push(sql`src.${sql.identifier(spec.weights)}::float8 AS __weight`);
  if (spec.standardErrors.type === 'cluster') {
    columns.push(sql`src.${sql.identifier(spec.standardErrors.column)} AS __cluster`);
  }
  return sql`SELECT ${sql.join(columns, sql`, `)} FROM ${table}`;
}

/**
 * The demand design as the elasticity formulas need it: each term with a single "row" holding
 * its (weighted) mean, so that the mean the formulas take is the database's.
 */
function designAtMeans(
  spec: InDatabaseDemandSpec,
  continuous: readonly ContinuousColumn[],
  dummies: readonly DummyColumn[],
  means: ColumnMeans,
): DemandDesign {
  const kinds = new Map(spec.covariates.map((c) => [c.column, c.role]));
  const terms: DemandTerm[] = [
    ...continuous.map((c, i) => ({
      name: c.column,
      kind: i === 0 ? ('own-price' as const) : (kinds.get(c.column) ?? 'other'),
      logged: c.logged,
      raw: [means.raw.get(c.column)!],
    })),
    ...dummies.map((d) => ({
      name: d.name,
      kind: 'fixed-effect' as const,
      logged: false,
      raw: [means.transformed.get(d.name)!],
    })),
  ];
  const responseLogged = spec.form !== 'linear';
  return {
    response: { name: spec.quantity, values: [] },
    responseLogged,
    terms,
    regressors: [],
    instruments: [],
    loggedColumns: [
      ...(responseLogged ? [spec.quantity] : []),
      ...continuous.filter((c) => c.logged).map((c) => c.column),
      ...(spec.form === 'loglog' ? spec.instruments : []),
    ],
    fixedEffectBases: {},
  };
}
