/**
 * Plain tests of an answer's parts for the quick answer tests (`answerFitsFor`). Each accepts
 * only what the zod check it stands in for accepts, and runs in a fraction of its time.
 */

/**
 * An object (not null, not an array) whose enumerable keys, own or inherited, are all among
 * `keys` — what a zod strict object lets through before it looks at the fields.
 */
export function isRecordWith(
  value: unknown,
  keys: readonly string[],
): value is Readonly<Record<string, unknown>> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  for (const key in value) if (!keys.includes(key)) return false;
  return true;
}

/** A safe integer from `min` to `max`, as `z.int().min(min).max(max)` accepts. */
export function isWholeBetween(value: unknown, min: number, max: number): value is number {
  return Number.isSafeInteger(value) && (value as number) >= min && (value as number) <= max;
}

/** A finite number from `min` to `max`, as `z.number().min(min).max(max)` accepts. */
export function isNumberBetween(value: unknown, min: number, max: number): value is number {
  return Number.isFinite(value) && (value as number) >= min && (value as number) <= max;
}

/** Whether every item of `values` differs from the others. */
export function allDistinct(values: readonly unknown[]): boolean {
  return new Set(values).size === values.length;
}
