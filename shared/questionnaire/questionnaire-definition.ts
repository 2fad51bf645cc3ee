import { z } from 'zod';
import { blockSchema } from './block';

/**
 * A questionnaire version's content: its blocks in the order they are asked. The structure is
 * checked here; the rules that span blocks (consent first, unique ids, conditions on earlier
 * blocks) by `validateQuestionnaire`, which the server runs before storing any definition.
 */
export const questionnaireDefinitionSchema = z.strictObject({
  blocks: z.array(blockSchema).max(200, 'A questionnaire has at most 200 blocks'),
});
export type QuestionnaireDefinition = z.infer<typeof questionnaireDefinitionSchema>;
