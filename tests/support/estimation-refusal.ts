import { EstimationError } from '@shared/estimation/estimation-error';

/** What a test checks of a refusal: the machine code, the field named, and the message. */
export interface Refusal {
  readonly code: string;
  readonly field: string | undefined;
  readonly message: string;
}

/**
 * Runs `run`, which must throw an EstimationError, and returns its code, field and message, so
 * a spec can write `expect(refusalOf(() => …)).toMatchObject({ code, field })`.
 */
export function refusalOf(run: () => unknown): Refusal {
  try {
    run();
  } catch (error) {
    if (error instanceof EstimationError) {
      return { code: error.code, field: error.field, message: error.message };
    }
    throw error;
  }
  throw new Error('expected an EstimationError, but nothing was thrown');
}
