import { EstimationError } from '@shared/estimation/estimation-error';
import type {
  DemandCovariate,
  DemandForm,
} from '@shared/estimation/least-squares/demand-model-spec';
import { fitDemandModel } from '@shared/estimation/least-squares/fit-demand-model';
import { fitInstrumentalModel } from '@shared/estimation/least-squares/fit-instrumental-model';
import { fitLinearModel } from '@shared/estimation/least-squares/fit-linear-model';
import { fixedEffectColumns } from '@shared/estimation/least-squares/fixed-effect-columns';
import type { NamedColumn } from '@shared/estimation/least-squares/named-column';
import type { DataTable } from '../data-table';
import type { FitMethod } from '../fit-method';
import {
  column,
  demandForm,
  optionalList,
  optionalText,
  requiredList,
  requiredText,
  standardErrorsOption,
} from './ols-options';
import { numberOption, type MethodOptions } from './survey-options';

const KNOWN = [
  'y',
  'x',
  'no-intercept',
  'form',
  'weights',
  'se',
  'instrument',
  'endogenous',
  'fixed-effects',
  'level',
  'income',
  'cross-price',
  'at-price',
  'at-quantity',
];

/**
 * Least squares. --y COL --x COL,COL [--no-intercept] [--weights COL]
 * [--se classical|hc1|cluster:COL] [--fixed-effects COL,…] [--level 0.95]
 * [--instrument COL,… --endogenous COL,…] (two-stage least squares).
 * Demand curves: --form linear|loglog|semilog, where --y is the quantity and the first --x the
 * own price; --income COL and --cross-price COL mark covariates (also added to --x if absent);
 * --at-price N, --at-quantity N set where linear and semi-log elasticities are evaluated.
 */
export const olsMethod: FitMethod = {
  name: 'ols',
  run(table, options) {
    const unknown = Object.keys(options).filter((name) => !KNOWN.includes(name));
    if (unknown.length > 0) {
      throw new EstimationError(
        'invalid-option',
        `ols does not know --${unknown.join(', --')}`,
        unknown[0],
      );
    }
    const form = options['form'];
    const result =
      form === undefined ? fitPlain(table, options) : fitDemand(table, options, demandForm(form));
    return { method: 'ols', ...result };
  },
};

function fitPlain(table: DataTable, options: MethodOptions): Record<string, unknown> {
  const common = commonSpec(table, options);
  const response = column(table, requiredText(options, 'y'));
  const regressors = [
    ...requiredList(options, 'x').map((name) => column(table, name)),
    ...fixedEffects(table, options, common.intercept),
  ];
  if (options['instrument'] === undefined)
    return fitLinearModel({ ...common, response, regressors });
  const endogenous = requiredList(options, 'endogenous');
  for (const name of endogenous) {
    if (!regressors.some((c) => c.name === name)) {
      throw new EstimationError(
        'invalid-option',
        `--endogenous ${name} is not one of the --x columns`,
        'endogenous',
      );
    }
  }
  return fitInstrumentalModel({
    ...common,
    response,
    exogenous: regressors.filter((c) => !endogenous.includes(c.name)),
    endogenous: endogenous.map((name) => regressors.find((c) => c.name === name)!),
    instruments: requiredList(options, 'instrument').map((name) => column(table, name)),
  });
}

function fitDemand(
  table: DataTable,
  options: MethodOptions,
  form: DemandForm,
): Record<string, unknown> {
  const [priceName, ...covariateNames] = requiredList(options, 'x');
  const income = optionalText(options, 'income');
  const crossPrice = optionalText(options, 'cross-price');
  for (const name of [income, crossPrice])
    if (name && !covariateNames.includes(name)) covariateNames.push(name);
  const covariates: DemandCovariate[] = covariateNames.map((name) => ({
    ...column(table, name),
    role: name === income ? 'income' : name === crossPrice ? 'cross-price' : 'other',
  }));
  const effects = optionalList(options, 'fixed-effects');
  return fitDemandModel({
    ...commonSpec(table, options),
    form,
    quantity: column(table, requiredText(options, 'y')),
    price: column(table, priceName),
    covariates,
    fixedEffects: effects.map((name) => ({ name, values: table.texts(name) })),
    instruments: optionalList(options, 'instrument').map((name) => column(table, name)),
    endogenous:
      options['endogenous'] === undefined ? undefined : optionalList(options, 'endogenous'),
    evaluateAt: {
      price: numberOption(options, 'at-price'),
      quantity: numberOption(options, 'at-quantity'),
    },
  });
}

function commonSpec(table: DataTable, options: MethodOptions) {
  const weights = optionalText(options, 'weights');
  return {
    intercept: options['no-intercept'] !== true,
    weights: weights === undefined ? undefined : column(table, weights),
    standardErrors: standardErrorsOption(table, options),
    confidenceLevel: numberOption(options, 'level', 0.95),
  };
}

function fixedEffects(table: DataTable, options: MethodOptions, intercept: boolean): NamedColumn[] {
  return optionalList(options, 'fixed-effects').flatMap(
    (name) =>
      fixedEffectColumns({ name, values: table.texts(name) }, table.rowCount, intercept).columns,
  );
}
