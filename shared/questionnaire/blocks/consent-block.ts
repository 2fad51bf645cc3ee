import { z } from 'zod';
import { storableText } from '../../storable/storable-text';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/**
 * Consent: the statement the enumerator reads before anything else is asked. It is always the
 * first block and always required; with no consent, the interview keeps no other answer.
 */
export const consentBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('consent'),
  required: z.literal(true, { error: 'Consent is always required' }),
  statement: storableText({ error: 'Write the consent statement' })
    .trim()
    .min(1, 'Write the consent statement')
    .max(4000, 'Keep the statement under 4000 characters'),
});
export type ConsentBlock = z.infer<typeof consentBlockSchema>;

/** The respondent agreed or declined. */
export function consentAnswerSchema(_block: ConsentBlock) {
  return z.strictObject({ agreed: z.boolean({ error: 'Record whether they agreed' }) });
}
export type ConsentAnswer = z.infer<ReturnType<typeof consentAnswerSchema>>;

const consentKeys = ['agreed'];

/** The quick test of a consent answer (see `answerFitsFor`). */
export function consentAnswerFits(_block: ConsentBlock) {
  return (answer: unknown) =>
    isRecordWith(answer, consentKeys) && typeof answer['agreed'] === 'boolean';
}
