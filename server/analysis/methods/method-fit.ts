import type { RespondentEvidence } from '@shared/analysis/cell-support';
import type { CurveDescription } from '@shared/analysis/curve-description';
import type { FitCoefficient, FitResult, KeyFigure } from '@shared/analysis/fit-result';
import type { IntervalEstimate } from '@shared/estimation/maximum-likelihood/delta-method';
import { extent } from '@shared/estimation/numerics/extent';

/** What one method's estimator gives the fit result, before the schedule is tabulated. */
export interface MethodFit {
  /** Respondents whose answers the estimator used. */
  readonly n: number;
  readonly observations: number;
  readonly coefficients: FitCoefficient[];
  readonly fitStatistics: FitResult['fitStatistics'];
  readonly elasticities: FitResult['elasticities'];
  readonly keyFigures: KeyFigure[];
  readonly tables: FitResult['tables'];
  readonly residuals: FitResult['residuals'];
  readonly curve: CurveDescription | null;
  /** Why there is no curve, when there is none. */
  readonly noCurveReason: string | null;
  /** Per respondent, the prices their answers speak to (for the five-respondent rule). */
  readonly evidence: RespondentEvidence[];
  readonly warnings: string[];
  readonly assumptions: string[];
}

/** An interval estimate as a key figure. */
export function figure(label: string, unit: KeyFigure['unit'], value: IntervalEstimate): KeyFigure {
  return { label, unit, estimate: value.estimate, ciLow: value.ciLow, ciHigh: value.ciHigh };
}

/** A point estimate without an interval (the method gives none). */
export function pointFigure(label: string, unit: KeyFigure['unit'], estimate: number): KeyFigure {
  return { label, unit, estimate, ciLow: null, ciHigh: null };
}

/** A coefficient row from an interval estimate (no p-value). */
export function coefficientFrom(term: string, value: IntervalEstimate): FitCoefficient {
  return {
    term,
    estimate: value.estimate,
    stdError: value.stdError,
    ciLow: value.ciLow,
    ciHigh: value.ciHigh,
    pValue: null,
  };
}

/** The smallest and largest of some prices. */
export function rangeOf(prices: readonly number[]): { min: number; max: number } {
  return extent(prices);
}
