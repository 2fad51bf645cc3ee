import type { FieldIssue } from '@shared/http/api-error';

/** Issues sorted onto the form's fields; those that fit no field are kept for the form itself. */
export interface SortedIssues<F extends string> {
  readonly byField: Partial<Record<F, string>>;
  readonly unplaced: readonly string[];
}

/**
 * Places each issue on the field its path starts with (`roles.0` belongs to `roles`). The first
 * message for a field wins, so the person fixes one thing at a time.
 */
export function sortIssues<F extends string>(
  issues: readonly FieldIssue[],
  fields: readonly F[],
): SortedIssues<F> {
  const byField: Partial<Record<F, string>> = {};
  const unplaced: string[] = [];
  for (const issue of issues) {
    const head = issue.path.split('.')[0];
    const field = fields.find((name) => name === head);
    if (field === undefined) unplaced.push(issue.message);
    else byField[field] ??= issue.message;
  }
  return { byField, unplaced };
}
