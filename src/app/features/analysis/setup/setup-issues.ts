import type { FieldIssue } from '@shared/http/api-error';

/** The issues whose path starts with one of `prefixes` (a card shows only its own). */
export function issuesUnder(
  issues: readonly FieldIssue[],
  ...prefixes: string[]
): readonly FieldIssue[] {
  return issues.filter((issue) =>
    prefixes.some((prefix) => issue.path === prefix || issue.path.startsWith(`${prefix}.`)),
  );
}
