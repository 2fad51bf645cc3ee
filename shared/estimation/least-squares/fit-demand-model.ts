import { EstimationError } from '../estimation-error';
import { buildDemandDesign, type DemandDesign } from './demand-design';
import { demandElasticities } from './demand-elasticities';
import type { DemandFit } from './demand-fit';
import type { DemandModelSpec } from './demand-model-spec';
import { fitInstrumentalModel } from './fit-instrumental-model';
import { fitLinearModel } from './fit-linear-model';
import type { InstrumentalFit } from './instrumental-fit';
import type { LinearFit } from './linear-fit';

/**
 * Fits a demand curve in linear, log-log or semi-log form with covariates (income, other
 * products' prices, …) and fixed effects, by least squares or — when instruments are given —
 * two-stage least squares, and reports own-price, cross-price and income elasticities with
 * t intervals (delta method where the elasticity is a function of the coefficients).
 */
export function fitDemandModel(spec: DemandModelSpec): DemandFit {
  const design = buildDemandDesign(spec);
  const fit = spec.instruments?.length ? instrumentalFit(spec, design) : ordinaryFit(spec, design);
  const elasticities = demandElasticities(design, fit, spec.weights, spec.evaluateAt);
  return {
    ...fit,
    form: spec.form,
    loggedColumns: [...design.loggedColumns],
    fixedEffectBases: design.fixedEffectBases,
    elasticities,
    assumptions: [...fit.assumptions, ...formAssumptions(spec, design)],
  };
}

function ordinaryFit(spec: DemandModelSpec, design: DemandDesign): LinearFit {
  return fitLinearModel({
    response: design.response,
    regressors: design.regressors,
    intercept: spec.intercept,
    weights: spec.weights,
    standardErrors: spec.standardErrors,
    confidenceLevel: spec.confidenceLevel,
    maxConditionNumber: spec.maxConditionNumber,
  });
}

function instrumentalFit(spec: DemandModelSpec, design: DemandDesign): InstrumentalFit {
  const endogenous = spec.endogenous ?? [spec.price.name];
  for (const name of endogenous) {
    if (!design.regressors.some((column) => column.name === name)) {
      throw new EstimationError(
        'missing-column',
        `endogenous regressor ${name} is not among the model's regressors`,
        name,
      );
    }
  }
  return fitInstrumentalModel({
    response: design.response,
    exogenous: design.regressors.filter((column) => !endogenous.includes(column.name)),
    endogenous: endogenous.map((name) => design.regressors.find((c) => c.name === name)!),
    instruments: design.instruments,
    intercept: spec.intercept,
    weights: spec.weights,
    standardErrors: spec.standardErrors,
    confidenceLevel: spec.confidenceLevel,
    maxConditionNumber: spec.maxConditionNumber,
  });
}

function formAssumptions(spec: DemandModelSpec, design: DemandDesign): string[] {
  const notes = [
    {
      linear:
        'linear demand: elasticities vary along the curve and are reported at the evaluation point',
      loglog:
        'log-log (constant-elasticity) demand: logged coefficients are elasticities everywhere',
      semilog: 'semi-log demand (ln q on levels): the elasticity β·x grows in proportion to x',
    }[spec.form],
    `columns entered as natural logarithms: ${design.loggedColumns.join(', ') || 'none'}`,
    'elasticities are evaluated at stated values, otherwise at the (weighted) means of the columns',
  ];
  for (const [column, base] of Object.entries(design.fixedEffectBases)) {
    notes.push(
      `fixed effects for ${column}${base === null ? ' (no base level dropped)' : `, base level ${base}`}`,
    );
  }
  return notes;
}
