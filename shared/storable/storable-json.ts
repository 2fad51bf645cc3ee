import type { z } from 'zod';
import { unstorableJsonProblems } from './unstorable-json';

/**
 * A zod refinement for a free JSON payload (an interview's answers): each place the database
 * would refuse becomes an issue at its own path, e.g. `answers.notes.value`.
 */
export function refuseUnstorableJson(value: unknown, ctx: z.RefinementCtx): void {
  for (const problem of unstorableJsonProblems(value)) {
    ctx.addIssue({ code: 'custom', path: problem.path, message: problem.message, input: value });
  }
}
