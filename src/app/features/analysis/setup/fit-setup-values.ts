import type { AnalysisMethod } from '@shared/analysis/analysis-method';
import {
  defaultBootstrap,
  fitSpecSchema,
  type FitSpec,
  demandForms,
  instrumentChoices,
  regressionCovariates,
  standardErrorTypes,
} from '@shared/analysis/fit-spec';
import type { InterviewFilter } from '@shared/analysis/interview-filter';
import type { RakingVariable, WeightingSpec } from '@shared/analysis/weighting-spec';
import type { FieldIssue } from '@shared/http/api-error';

/** One row of the raking table: a level of a variable and its population share in percent. */
export interface MarginRow {
  readonly variable: RakingVariable;
  readonly level: string;
  readonly targetPercent: number | null;
}

/** Everything the set-up screen holds, as plain values (what the form gives). */
export interface FitSetupValues {
  readonly from: string;
  readonly to: string;
  readonly routeIds: readonly string[];
  readonly regions: readonly string[];
  readonly flagged: InterviewFilter['flagged'];
  readonly weightingOn: boolean;
  readonly margins: readonly MarginRow[];
  readonly method: AnalysisMethod;
  readonly source: 'shelf' | 'recall';
  readonly form: (typeof demandForms)[number];
  readonly covariates: readonly (typeof regressionCovariates)[number][];
  readonly regionEffects: boolean;
  readonly standardErrors: (typeof standardErrorTypes)[number];
  readonly instrument: (typeof instrumentChoices)[number];
  readonly distribution: 'normal' | 'logistic';
  readonly replicates: number;
  readonly seed: number;
  readonly gridFrom: number | null;
  readonly gridTo: number | null;
  readonly gridSteps: number | null;
  readonly unitCost: number | null;
  readonly confidencePercent: number;
}

/** A fresh set-up for a study whose price range is `priceRange` (major units). */
export function defaultSetupValues(priceRange: { min: number; max: number }): FitSetupValues {
  return {
    from: '',
    to: '',
    routeIds: [],
    regions: [],
    flagged: 'exclude',
    weightingOn: false,
    margins: [],
    method: 'observed-prices',
    source: 'shelf',
    form: 'loglog',
    covariates: [],
    regionEffects: false,
    standardErrors: 'hc1',
    instrument: 'none',
    distribution: 'logistic',
    replicates: defaultBootstrap.replicates,
    seed: defaultBootstrap.seed,
    gridFrom: priceRange.min,
    gridTo: priceRange.max,
    gridSteps: 11,
    unitCost: null,
    confidencePercent: 95,
  };
}

/** The raking margins of the table: one per variable, its levels' shares as given. */
export function weightingOf(rows: readonly MarginRow[]): WeightingSpec {
  const margins = new Map<RakingVariable, Record<string, number>>();
  for (const row of rows) {
    const targets = margins.get(row.variable) ?? {};
    targets[row.level.trim()] = row.targetPercent ?? Number.NaN;
    margins.set(row.variable, targets);
  }
  return { margins: [...margins].map(([variable, targets]) => ({ variable, targets })) };
}

function filterOf(values: FitSetupValues): InterviewFilter {
  return {
    ...(values.from ? { from: values.from } : {}),
    ...(values.to ? { to: values.to } : {}),
    ...(values.routeIds.length ? { routeIds: [...values.routeIds] } : {}),
    ...(values.regions.length ? { regions: [...values.regions] } : {}),
    flagged: values.flagged,
  };
}

function methodOptions(values: FitSetupValues): Record<string, unknown> {
  switch (values.method) {
    case 'observed-prices':
      return {
        source: values.source,
        form: values.form,
        covariates: [...values.covariates],
        regionEffects: values.regionEffects,
        standardErrors: values.standardErrors,
        instrument: values.instrument,
      };
    case 'wtp-open':
      return { bootstrap: { replicates: values.replicates, seed: values.seed } };
    case 'payment-card':
      return { distribution: values.distribution };
    default:
      return {};
  }
}

/**
 * The fit specification the set-up describes, checked with the same schema the server uses, or
 * the problems found, each naming the field (`priceGrid.to`, `weighting.margins.0.targets`…).
 */
export function fitSpecFrom(
  values: FitSetupValues,
): { ok: true; spec: FitSpec } | { ok: false; issues: FieldIssue[] } {
  const candidate = {
    method: values.method,
    filters: filterOf(values),
    weighting: values.weightingOn ? weightingOf(values.margins) : null,
    priceGrid: { from: values.gridFrom, to: values.gridTo, steps: values.gridSteps },
    unitCost: values.unitCost,
    confidenceLevel: values.confidencePercent / 100,
    ...methodOptions(values),
  };
  const parsed = fitSpecSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, spec: parsed.data };
  return {
    ok: false,
    issues: parsed.error.issues.map((issue) => ({
      path: issue.path.join('.'),
      message: issue.message,
    })),
  };
}
