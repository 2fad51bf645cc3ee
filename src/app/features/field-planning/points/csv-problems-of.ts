import { HttpErrorResponse } from '@angular/common/http';
import type { CsvProblem } from '@shared/sampling/csv-problem';

/** The line-by-line problems of a refused import, or null when the failure was something else. */
export function csvProblemsOf(error: unknown): CsvProblem[] | null {
  if (!(error instanceof HttpErrorResponse) || error.status !== 400) return null;
  const body: unknown = error.error;
  if (typeof body !== 'object' || body === null || !('error' in body)) return null;
  const inner = (body as { error: { code?: unknown; problems?: unknown } }).error;
  if (inner.code !== 'invalid-csv' || !Array.isArray(inner.problems)) return null;
  return inner.problems.filter(isProblem);
}

function isProblem(value: unknown): value is CsvProblem {
  if (typeof value !== 'object' || value === null) return false;
  const { line, column, message } = value as Record<string, unknown>;
  return typeof line === 'number' && typeof column === 'string' && typeof message === 'string';
}
