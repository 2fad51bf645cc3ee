import { starterBlock } from './block-starters';
import { everyKindQuestionnaire } from './every-kind-questionnaire';
import { publishingProblems } from './publishing-problems';

describe('publishingProblems', () => {
  it('refuses a questionnaire with nothing after consent', () => {
    expect(
      publishingProblems({ blocks: [starterBlock('consent', 'consent')] }).map((p) => p.message),
    ).toEqual(['Add at least one question after consent before publishing']);
  });

  it('passes a valid questionnaire with questions', () => {
    expect(publishingProblems(everyKindQuestionnaire())).toEqual([]);
  });
});
