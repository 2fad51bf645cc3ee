import { z } from 'zod';

/**
 * One thing wrong with an uploaded file: the file's line number (the header is line 1), the
 * column's header (empty when the whole row or file is at fault) and what to change.
 */
export const csvProblemSchema = z.object({
  line: z.number().int().min(1),
  column: z.string(),
  message: z.string(),
});
export type CsvProblem = z.infer<typeof csvProblemSchema>;

/** Problems in file order; within a line they keep the order they were found in. */
export function sortProblems(problems: readonly CsvProblem[]): CsvProblem[] {
  return [...problems].sort((a, b) => a.line - b.line);
}
