import { TestBed } from '@angular/core/testing';
import { MoneyField } from './money-field';

describe('MoneyField', () => {
  async function emptied(emptyHint?: string) {
    const fixture = TestBed.createComponent(MoneyField);
    fixture.componentRef.setInput('label', 'Highest price accepted');
    fixture.componentRef.setInput('valueMinor', 100000);
    fixture.componentRef.setInput('money', { currency: 'KES', locale: 'en-KE' });
    if (emptyHint !== undefined) fixture.componentRef.setInput('emptyHint', emptyHint);
    const emitted: (number | undefined)[] = [];
    fixture.componentInstance.valueMinorChange.subscribe((value) => emitted.push(value));
    await fixture.whenStable();
    const input = (fixture.nativeElement as HTMLElement).querySelector('input')!;
    input.value = '';
    input.dispatchEvent(new Event('input'));
    fixture.componentRef.setInput('valueMinor', undefined);
    await fixture.whenStable();
    return { text: (fixture.nativeElement as HTMLElement).textContent ?? '', emitted };
  }

  it('asks for an amount when a required one is emptied', async () => {
    const { text, emitted } = await emptied();
    expect(emitted).toEqual([undefined]);
    expect(text).toContain('Enter an amount');
  });

  it('takes an emptied optional amount as none and says what applies instead', async () => {
    const { text, emitted } = await emptied('Left empty, the general cap applies');
    expect(emitted).toEqual([undefined]);
    expect(text).not.toContain('Enter an amount');
    expect(text).toContain('Left empty, the general cap applies');
  });
});
