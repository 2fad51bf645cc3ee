/**
 * A pass found that some value could not enter the sums (NULL, NaN, infinite, a log of a
 * non-positive number, a weight that is not positive). It carries no column: the fit then runs
 * a diagnosis query that names the column and counts the rows at fault.
 */
export class InputProblem extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'InputProblem';
  }
}

/** The SQLSTATE of a PostgreSQL error, also when drizzle wraps it (as `cause`). */
export function sqlState(error: unknown): string | undefined {
  for (let e = error; e instanceof Error; e = e.cause) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string') return code;
  }
  return undefined;
}

/** PostgreSQL data exceptions (SQLSTATE class 22: ln of zero, sqrt of a negative, overflow). */
export function isDataException(error: unknown): boolean {
  return sqlState(error)?.startsWith('22') ?? false;
}
