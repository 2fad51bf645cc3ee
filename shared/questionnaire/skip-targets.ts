import type { Block } from './block';
import type { SkipCondition, SkipTest } from './skip-condition';

const numericKinds = ['number', 'household-size', 'wtp-open', 'purchase-recall'] as const;
const valueKinds = ['single-choice', 'multiple-choice', 'income-band', 'dichotomous-choice'];

/**
 * The tests a later block's condition may make on `block`. Consent cannot be tested (nothing
 * is asked without it); numeric answers allow every test; choices allow is / is not; the rest
 * only whether they were answered.
 */
export function skipTestsFor(block: Block): readonly SkipTest[] {
  if (block.kind === 'consent') return [];
  if ((numericKinds as readonly string[]).includes(block.kind)) {
    return ['equals', 'not-equals', 'less', 'greater', 'answered'];
  }
  if (valueKinds.includes(block.kind)) return ['equals', 'not-equals', 'answered'];
  return ['answered'];
}

/** The values an is / is not test may compare with, or null when the block's answer is a number. */
export function skipValuesFor(block: Block): readonly string[] | null {
  switch (block.kind) {
    case 'single-choice':
    case 'multiple-choice':
      return block.options.map((o) => o.value);
    case 'income-band':
      return block.bands.map((b) => b.value);
    case 'dichotomous-choice':
      return ['yes', 'no'];
    default:
      return null;
  }
}

/** Why `condition` cannot test `target`, or null when it can. */
export function skipConditionProblem(condition: SkipCondition, target: Block): string | null {
  const tests = skipTestsFor(target);
  if (!tests.includes(condition.test)) {
    return tests.length === 0
      ? `A condition cannot look at the ${target.kind} block "${target.id}"`
      : `"${target.id}" (${target.kind}) can only be tested with: ${tests.join(', ')}`;
  }
  if (condition.test === 'answered') return null;
  const values = skipValuesFor(target);
  if (values === null && typeof condition.value !== 'number') {
    return `"${target.id}" records a number; compare it with a number`;
  }
  if (
    values !== null &&
    (typeof condition.value !== 'string' || !values.includes(condition.value))
  ) {
    return `"${target.id}" has no answer "${condition.value}"; choose one of: ${values.join(', ')}`;
  }
  return null;
}

/**
 * The part of an answer a condition looks at: the chosen value(s), or the number recorded.
 * Undefined when there is no answer or the block is not one conditions can compare.
 */
export function skipSubjectOf(
  block: Block,
  answer: unknown,
): string | number | string[] | null | undefined {
  if (answer === undefined || answer === null || typeof answer !== 'object') return undefined;
  const record = answer as Record<string, unknown>;
  switch (block.kind) {
    case 'single-choice':
    case 'number':
      return record['value'] as string | number | undefined;
    case 'multiple-choice':
      return record['values'] as string[] | undefined;
    case 'income-band':
      return record['band'] as string | null | undefined;
    case 'dichotomous-choice':
      return record['firstResponse'] as string | undefined;
    case 'household-size':
      return record['people'] as number | undefined;
    case 'wtp-open':
      return record['amountMinor'] as number | undefined;
    case 'purchase-recall':
      return record['units'] as number | undefined;
    default:
      return undefined;
  }
}
