import { ComponentFixture, TestBed } from '@angular/core/testing';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type {
  PriceThresholdsAnswer,
  PriceThresholdsBlock,
} from '@shared/questionnaire/blocks/price-thresholds-block';
import { PriceThresholdsBlockView } from './price-thresholds-block-view';

const block = {
  ...starterBlock('price-thresholds', 'thresholds'),
  askLikelihood: true,
} as PriceThresholdsBlock;
const stored: PriceThresholdsAnswer = {
  tooCheapMinor: 30000,
  cheapMinor: 60000,
  expensiveMinor: 90000,
  tooExpensiveMinor: 99000,
  likelihoodCheap: 3,
  likelihoodExpensive: 5,
};

describe('PriceThresholdsBlockView', () => {
  let fixture: ComponentFixture<PriceThresholdsBlockView>;
  let emitted: (PriceThresholdsAnswer | undefined)[];

  async function render(answer: PriceThresholdsAnswer | undefined): Promise<void> {
    TestBed.configureTestingModule({ imports: [PriceThresholdsBlockView] });
    fixture = TestBed.createComponent(PriceThresholdsBlockView);
    fixture.componentRef.setInput('block', block);
    fixture.componentRef.setInput('answer', answer);
    emitted = [];
    fixture.componentInstance.answerChange.subscribe((value) => emitted.push(value));
    await fixture.whenStable();
  }

  const selects = () =>
    [...(fixture.nativeElement as HTMLElement).querySelectorAll('select')] as HTMLSelectElement[];
  const chosen = (select: HTMLSelectElement) => select.selectedOptions[0]?.textContent?.trim();

  it('shows the stored likelihoods as chosen when the screen opens again', async () => {
    await render(stored);
    expect(selects().map((select) => select.value)).toEqual(['3', '5']);
    expect(selects().map(chosen)).toEqual(['3 · Unsure', '5 · Certainly']);
  });

  it('shows "Choose…" for a likelihood not answered yet', async () => {
    await render({ ...stored, likelihoodExpensive: undefined });
    expect(selects().map(chosen)).toEqual(['3 · Unsure', 'Choose…']);
  });

  it('follows a stored answer that arrives after the screen is drawn', async () => {
    await render(undefined);
    expect(selects().map(chosen)).toEqual(['Choose…', 'Choose…']);
    fixture.componentRef.setInput('answer', stored);
    await fixture.whenStable();
    expect(selects().map((select) => select.value)).toEqual(['3', '5']);
  });

  it('records a likelihood chosen, keeping the other parts', async () => {
    await render(stored);
    const [cheap] = selects();
    cheap.value = '4';
    cheap.dispatchEvent(new Event('change'));
    expect(emitted).toEqual([{ ...stored, likelihoodCheap: 4 }]);
  });
});
