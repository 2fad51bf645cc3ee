import { TestBed } from '@angular/core/testing';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { QuestionnaireProblem } from '@shared/questionnaire/questionnaire-problem';
import { ProblemList } from './problem-list';

describe('ProblemList', () => {
  const blocks = [starterBlock('price-ladder', 'consent'), starterBlock('consent', 'consent')];
  const at = (blockIndex: number | null, path: string, message: string): QuestionnaireProblem => ({
    blockIndex,
    blockId: blockIndex === null ? null : blocks[blockIndex].id,
    path,
    message,
  });

  async function linkTexts(problems: QuestionnaireProblem[]) {
    const fixture = TestBed.createComponent(ProblemList);
    fixture.componentRef.setInput('problems', problems);
    fixture.componentRef.setInput('blocks', blocks);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    return Array.from(element.querySelectorAll('li')).map((item) =>
      item.firstElementChild?.textContent?.trim(),
    );
  }

  it('names each problem’s field with the label the editor shows', async () => {
    expect(
      await linkTexts([
        at(0, 'prompt', 'Write the question the enumerator reads out'),
        at(0, 'pricesMinor.1', 'Each price must be higher than the one before: price 2 is not'),
        at(1, 'kind', 'Consent must be the first block'),
        at(1, 'id', 'The id "consent" is already used by block 1'),
        at(null, 'blocks', 'The questionnaire must start with a consent block'),
      ]),
    ).toEqual([
      'Block 1 · Price ladder “consent” · Question read out',
      'Block 1 · Price ladder “consent” · Price 2',
      'Block 2 · Consent “consent”',
      'Block 2 · Consent “consent” · Block id',
      'Questionnaire',
    ]);
  });

  it('leaves no raw field keys or stray separators in the links', async () => {
    const texts = await linkTexts([at(0, 'maxPriceMinor', 'Too low'), at(1, 'kind', 'Move it')]);
    for (const text of texts) {
      expect(text).not.toMatch(/Minor|kind| \/ |·\s*$/);
    }
  });
});
