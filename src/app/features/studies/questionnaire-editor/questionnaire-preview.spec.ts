import { TestBed } from '@angular/core/testing';
import type { Block } from '@shared/questionnaire/block';
import { everyKindQuestionnaire } from '@shared/questionnaire/every-kind-questionnaire';
import { QuestionnairePreview } from './questionnaire-preview';

describe('QuestionnairePreview', () => {
  async function render(blocks: Block[]) {
    const fixture = TestBed.createComponent(QuestionnairePreview);
    fixture.componentRef.setInput('blocks', blocks);
    fixture.componentRef.setInput('money', { currency: 'KES', locale: 'en-KE' });
    await fixture.whenStable();
    return { fixture, element: fixture.nativeElement as HTMLElement };
  }

  const radio = (element: HTMLElement, blockId: string, label: string) =>
    Array.from(
      element.querySelectorAll<HTMLInputElement>(
        `[data-block-id="${blockId}"] input[type="radio"]`,
      ),
    ).find((input) => input.closest('label')?.textContent?.trim() === label)!;

  it('shows every kind of block with nothing answered yet', async () => {
    const { element } = await render(everyKindQuestionnaire().blocks);
    expect(element.querySelectorAll('app-block-view').length).toBe(16);
    const typed = Array.from(element.querySelectorAll<HTMLInputElement>('input.bv-input'));
    expect(typed.map((input) => input.value).filter((value) => value !== '')).toEqual([]);
    const checked = Array.from(element.querySelectorAll<HTMLInputElement>('input:checked'));
    expect(checked.map((input) => input.closest('label')?.textContent?.trim())).toEqual([]);
  });

  it('hides a block until its condition is met', async () => {
    const blocks = everyKindQuestionnaire().blocks;
    blocks[15] = {
      ...blocks[15],
      showIf: { blockId: 'single-choice', test: 'equals', value: 'yes' },
    };
    const { fixture, element } = await render(blocks);
    expect(element.textContent).toContain('1 block is not asked with these answers.');
    radio(element, 'single-choice', 'Yes').click();
    await fixture.whenStable();
    expect(element.querySelector('[data-block-id="text"] app-block-view')).not.toBeNull();
  });

  it('asks nothing after a refused consent', async () => {
    const { fixture, element } = await render(everyKindQuestionnaire().blocks);
    radio(element, 'consent', 'Declines — end the interview').click();
    await fixture.whenStable();
    expect(element.querySelectorAll('app-block-view').length).toBe(1);
  });
});
