/**
 * The value at a dotted path of a plain JSON-like result (`'logistic.revenueMaxPrice.estimate'`),
 * for specs that read command output without casting it to `any`.
 */
export function valueAt(result: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((node, key) => {
    if (node === null || typeof node !== 'object') {
      throw new Error(`no ${key} in the result at ${path}`);
    }
    return (node as Record<string, unknown>)[key];
  }, result);
}

/** The number at a dotted path; fails the test when it is not a number. */
export function numberAt(result: unknown, path: string): number {
  const value = valueAt(result, path);
  if (typeof value !== 'number') throw new Error(`${path} is not a number: ${String(value)}`);
  return value;
}
