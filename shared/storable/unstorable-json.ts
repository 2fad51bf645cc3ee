import { unstorableTextReason } from './unstorable-text';

/** Deeper than any answer needs; a limit also keeps the walk off the end of the stack. */
export const maxStorableJsonDepth = 32;

/** One place in a JSON value that the database would refuse, by its path from the value. */
export interface JsonProblem {
  path: (string | number)[];
  message: string;
}

/**
 * Every place in a JSON value (keys included) that PostgreSQL's jsonb would refuse: text with
 * NUL or a broken character, and nesting deeper than `maxStorableJsonDepth`. Empty when the
 * value stores as sent. Stops after a handful: one is enough to refuse, a few help to fix.
 */
export function unstorableJsonProblems(value: unknown): JsonProblem[] {
  const problems: JsonProblem[] = [];
  walk(value, [], problems);
  return problems;
}

const enough = 10;

function walk(value: unknown, path: (string | number)[], problems: JsonProblem[]): void {
  if (problems.length >= enough) return;
  if (typeof value === 'string') {
    const reason = unstorableTextReason(value);
    if (reason) problems.push({ path, message: reason });
    return;
  }
  if (typeof value !== 'object' || value === null) return;
  if (path.length >= maxStorableJsonDepth) {
    problems.push({ path, message: `Nested more than ${maxStorableJsonDepth} levels deep` });
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((item, index) => walk(item, [...path, index], problems));
    return;
  }
  for (const [key, item] of Object.entries(value)) {
    const keyReason = unstorableTextReason(key);
    if (keyReason) problems.push({ path, message: `A key here: ${keyReason.toLowerCase()}` });
    else walk(item, [...path, key], problems);
  }
}
