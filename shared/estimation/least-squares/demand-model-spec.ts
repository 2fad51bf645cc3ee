import type { StandardErrorSpec } from './coefficient-covariance';
import type { FixedEffectSpec } from './fixed-effect-columns';
import type { NamedColumn } from './named-column';

/**
 * linear: q = a + b·p + …; loglog: ln q = a + b·ln p + … (constant elasticity b);
 * semilog: ln q = a + b·p + … (elasticity b·p).
 */
export type DemandForm = 'linear' | 'loglog' | 'semilog';

/** What a covariate stands for, which names its elasticity. */
export type CovariateRole = 'income' | 'cross-price' | 'other';

/** A continuous covariate of a demand model. */
export interface DemandCovariate extends NamedColumn {
  /** Default 'other'. */
  readonly role?: CovariateRole;
  /** Enter as ln(value). Default: yes in the log-log form, no in the others. */
  readonly logged?: boolean;
}

/** Where elasticities are evaluated; anything not stated is taken at its (weighted) mean. */
export interface EvaluationPoint {
  readonly price?: number;
  /** A stated quantity is held fixed; otherwise the predicted quantity is used (delta method). */
  readonly quantity?: number;
  /** Covariate values by column name. */
  readonly covariates?: Readonly<Record<string, number>>;
}

/** A demand curve to estimate from observed prices and quantities. */
export interface DemandModelSpec {
  readonly form: DemandForm;
  readonly quantity: NamedColumn;
  readonly price: NamedColumn;
  readonly covariates?: readonly DemandCovariate[];
  /** Categorical columns (e.g. region) entered as dummies, base level dropped. */
  readonly fixedEffects?: readonly FixedEffectSpec[];
  readonly intercept?: boolean;
  readonly weights?: NamedColumn;
  readonly standardErrors?: StandardErrorSpec;
  readonly confidenceLevel?: number;
  readonly maxConditionNumber?: number;
  /** Excluded instruments; when given the fit is two-stage least squares. */
  readonly instruments?: readonly DemandCovariate[];
  /** Names of the endogenous regressors (default: the price). */
  readonly endogenous?: readonly string[];
  readonly evaluateAt?: EvaluationPoint;
}
