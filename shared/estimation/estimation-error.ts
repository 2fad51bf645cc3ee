/**
 * The one error every estimator throws when it refuses its input or cannot reach an estimate.
 * `code` is kebab-case and machine-readable (e.g. 'too-few-observations', 'singular-design',
 * 'non-positive-log', 'not-converged', 'missing-column', 'invalid-value'); `field` names the
 * column, option or parameter at fault when there is one.
 */
export class EstimationError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'EstimationError';
  }
}
