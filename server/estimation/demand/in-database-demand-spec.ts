import type { SQL } from 'drizzle-orm';
import type { CovariateRole, DemandForm } from '@shared/estimation/least-squares/demand-model-spec';
import type { InDatabaseStandardErrors } from '../in-database-model-spec';

/**
 * A demand model over a stored table, named by its columns: quantity on price in the chosen
 * form, covariates (income, another product's price, any number), fixed effects for grouping
 * columns (as dummies), analytic weights, the standard errors, and excluded instruments for
 * the own price (two-stage least squares).
 */
export interface InDatabaseDemandSpec {
  /** A stored table, or a query built with drizzle's `sql` template (never concatenated input). */
  readonly source: { readonly schema: string; readonly name: string } | { readonly query: SQL };
  readonly form: DemandForm;
  readonly quantity: string;
  readonly price: string;
  readonly covariates: readonly { readonly column: string; readonly role: CovariateRole }[];
  readonly fixedEffects: readonly string[];
  readonly weights?: string;
  readonly standardErrors: InDatabaseStandardErrors;
  readonly instruments: readonly string[];
  readonly confidenceLevel: number;
  /** A column holding each row's line in its source file, to name the line of a bad value. */
  readonly lineColumn?: string;
}

/** Fixed-effect groupings with more levels than this are refused (each level is a dummy). */
export const maxFixedEffectLevels = 500;
