import { TestBed } from '@angular/core/testing';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { ShelfObservationBlock } from '@shared/questionnaire/blocks/shelf-observation-block';
import { ShelfObservationSettings } from './shelf-observation-settings';

describe('ShelfObservationSettings', () => {
  async function render(change: Partial<ShelfObservationBlock> = {}, readOnly = false) {
    const block = {
      ...starterBlock('shelf-observation', 'shelf'),
      ...change,
    } as ShelfObservationBlock;
    const fixture = TestBed.createComponent(ShelfObservationSettings);
    fixture.componentRef.setInput('block', block);
    fixture.componentRef.setInput('money', { currency: 'KES', locale: 'en-KE' });
    fixture.componentRef.setInput('readOnly', readOnly);
    const emitted: Block[] = [];
    fixture.componentInstance.blockChange.subscribe((changed) => emitted.push(changed));
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const field = Array.from(element.querySelectorAll('app-money-field')).find((f) =>
      f.textContent?.includes('Highest shelf price an enumerator may record'),
    )!;
    const input = field.querySelector('input')!;
    const type = async (text: string) => {
      input.value = text;
      input.dispatchEvent(new Event('input'));
      await fixture.whenStable();
    };
    return { field, input, type, emitted };
  }

  it('leaves the highest shelf price empty and says which cap applies then', async () => {
    const { field, input } = await render();
    expect(input.value).toBe('');
    expect(field.querySelector('mat-hint')?.textContent).toContain('Left empty, prices up to');
    expect(field.querySelector('mat-hint')?.textContent).toContain('1,000,000.00');
  });

  it('shows a highest shelf price already set, written in the study’s currency', async () => {
    const { field, input } = await render({ maxPriceMinor: 250000 });
    expect(input.value).toBe('2500.00');
    expect(field.querySelector('mat-hint')?.textContent).toContain('2,500.00');
  });

  it('sets the highest shelf price from the amount typed', async () => {
    const { type, emitted } = await render();
    await type('2500');
    expect(emitted.at(-1)).toMatchObject({ kind: 'shelf-observation', maxPriceMinor: 250000 });
  });

  it('drops the highest shelf price when the field is emptied, without calling it a problem', async () => {
    const { field, type, emitted } = await render({ maxPriceMinor: 250000 });
    await type('');
    expect(emitted.at(-1)?.kind).toBe('shelf-observation');
    expect((emitted.at(-1) as ShelfObservationBlock).maxPriceMinor).toBeUndefined();
    expect(field.textContent).not.toContain('Enter an amount');
  });

  it('explains an amount it cannot read under the field', async () => {
    const { field, type, emitted } = await render();
    await type('12abc');
    expect((emitted.at(-1) as ShelfObservationBlock).maxPriceMinor).toBeUndefined();
    expect(field.querySelector('.field-error')).not.toBeNull();
  });

  it('lets a published version’s highest shelf price be read, not changed', async () => {
    const { input } = await render({ maxPriceMinor: 250000 }, true);
    expect(input.readOnly).toBe(true);
  });
});
