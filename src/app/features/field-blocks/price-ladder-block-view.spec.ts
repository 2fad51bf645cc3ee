import { ComponentFixture, TestBed } from '@angular/core/testing';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type {
  PriceLadderAnswer,
  PriceLadderBlock,
} from '@shared/questionnaire/blocks/price-ladder-block';
import { PriceLadderBlockView } from './price-ladder-block-view';

const block = {
  ...starterBlock('price-ladder', 'ladder'),
  pricesMinor: [80000, 110000, 140000, 170000],
  order: 'ascending',
} as PriceLadderBlock;

describe('PriceLadderBlockView', () => {
  let fixture: ComponentFixture<PriceLadderBlockView>;

  async function render(answer: PriceLadderAnswer | undefined): Promise<void> {
    TestBed.configureTestingModule({ imports: [PriceLadderBlockView] });
    fixture = TestBed.createComponent(PriceLadderBlockView);
    fixture.componentRef.setInput('block', block);
    fixture.componentRef.setInput('answer', answer);
    await fixture.whenStable();
  }

  /** Each step's price line, and whether it says it needs no asking. */
  const steps = () =>
    [...(fixture.nativeElement as HTMLElement).querySelectorAll('.ladder__step')].map((step) => [
      step.querySelector('.ladder__price')?.textContent?.trim(),
      step.querySelector('.bv-hint') !== null,
    ]);

  it('asks every price while nothing settles them', async () => {
    await render({ steps: [{ priceMinor: 80000, response: 'yes' }] });
    expect(steps().map(([, settled]) => settled)).toEqual([false, false, false, false]);
  });

  it('says the prices above a "no" need no asking', async () => {
    await render({
      steps: [
        { priceMinor: 80000, response: 'yes' },
        { priceMinor: 110000, response: 'no' },
      ],
    });
    expect(steps().map(([, settled]) => settled)).toEqual([false, false, true, true]);
  });
});
