import { EstimationError } from '../estimation-error';
import type { DemandCovariate, DemandModelSpec } from './demand-model-spec';
import { fixedEffectColumns } from './fixed-effect-columns';
import { logColumn } from './log-column';
import type { NamedColumn } from './named-column';

/** A regressor of the demand model, as the elasticity calculation needs to know it. */
export interface DemandTerm {
  readonly name: string;
  readonly kind: 'own-price' | 'income' | 'cross-price' | 'other' | 'fixed-effect';
  readonly logged: boolean;
  /** The untransformed values (for the evaluation point). */
  readonly raw: readonly number[];
}

/** The transformed columns a demand form regresses. */
export interface DemandDesign {
  readonly response: NamedColumn;
  readonly responseLogged: boolean;
  readonly terms: readonly DemandTerm[];
  readonly regressors: readonly NamedColumn[];
  readonly instruments: readonly NamedColumn[];
  readonly loggedColumns: readonly string[];
  readonly fixedEffectBases: Record<string, string | null>;
}

/**
 * Applies the demand form's logarithms (refusing non-positive values by column and row), checks
 * that the price varies, and appends fixed-effect dummies.
 */
export function buildDemandDesign(spec: DemandModelSpec): DemandDesign {
  const n = spec.quantity.values.length;
  if (n === 0) {
    throw new EstimationError('empty-data', 'there are no observations', spec.quantity.name);
  }
  checkPriceVaries(spec.price);
  const why = `${spec.form} demand form`;
  const defaultLogged = spec.form === 'loglog';
  const continuous = continuousTerms(spec, defaultLogged);
  const enter = (column: NamedColumn, logged: boolean): NamedColumn =>
    logged ? logColumn(column, why) : column;
  const columns = [spec.price, ...(spec.covariates ?? [])];
  const effects = fixedEffectTerms(spec, n);
  const instrumentLogged = (spec.instruments ?? []).map((c) => c.logged ?? defaultLogged);
  const responseLogged = spec.form !== 'linear';
  const terms = [...continuous, ...effects.terms];
  return {
    response: responseLogged ? logColumn(spec.quantity, why) : spec.quantity,
    responseLogged,
    terms,
    regressors: [...columns.map((c, i) => enter(c, continuous[i].logged)), ...effects.columns],
    instruments: (spec.instruments ?? []).map((c, i) => enter(c, instrumentLogged[i])),
    loggedColumns: [
      ...(responseLogged ? [spec.quantity.name] : []),
      ...terms.filter((t) => t.logged).map((t) => t.name),
      ...(spec.instruments ?? []).filter((_, i) => instrumentLogged[i]).map((c) => c.name),
    ],
    fixedEffectBases: effects.bases,
  };
}

/** The own price and the covariates, with the logarithm each enters with. */
function continuousTerms(spec: DemandModelSpec, defaultLogged: boolean): DemandTerm[] {
  const price: DemandTerm = {
    name: spec.price.name,
    kind: 'own-price',
    logged: defaultLogged,
    raw: spec.price.values,
  };
  const covariates = (spec.covariates ?? []).map((column: DemandCovariate) => ({
    name: column.name,
    kind: column.role ?? 'other',
    logged: column.logged ?? defaultLogged,
    raw: column.values,
  }));
  return [price, ...covariates];
}

/** Dummy columns for every fixed-effect column (base level dropped with an intercept). */
function fixedEffectTerms(spec: DemandModelSpec, n: number) {
  const bases: Record<string, string | null> = {};
  const columns: NamedColumn[] = [];
  for (const effect of spec.fixedEffects ?? []) {
    const dummies = fixedEffectColumns(effect, n, spec.intercept ?? true);
    bases[effect.name] = dummies.base;
    columns.push(...dummies.columns);
  }
  const terms = columns.map(
    (c): DemandTerm => ({ name: c.name, kind: 'fixed-effect', logged: false, raw: c.values }),
  );
  return { bases, columns, terms };
}

function checkPriceVaries(price: NamedColumn): void {
  // A non-finite price is reported later with its row; only judge variation on clean columns.
  if (!price.values.every((v) => Number.isFinite(v))) return;
  const levels = new Set(price.values);
  if (levels.size < 2) {
    throw new EstimationError(
      'no-price-variation',
      `column ${price.name} takes a single value; a demand curve needs at least two price levels`,
      price.name,
    );
  }
}
