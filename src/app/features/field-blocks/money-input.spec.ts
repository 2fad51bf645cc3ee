import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MoneyInput } from './money-input';
import { TypingProblems } from './typing-problems';

describe('MoneyInput', () => {
  let fixture: ComponentFixture<MoneyInput>;
  let typing: TypingProblems;
  let emitted: (number | undefined)[];

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [MoneyInput], providers: [TypingProblems] });
    typing = TestBed.inject(TypingProblems);
    fixture = TestBed.createComponent(MoneyInput);
    fixture.componentRef.setInput('label', 'Most they would pay');
    fixture.componentRef.setInput('part', 'amountMinor');
    fixture.componentRef.setInput('currency', 'KES');
    fixture.componentRef.setInput('locale', 'en-KE');
    emitted = [];
    fixture.componentInstance.valueMinorChange.subscribe((value) => emitted.push(value));
    await fixture.whenStable();
  });

  const type = async (text: string) => {
    const input = (fixture.nativeElement as HTMLElement).querySelector('input')!;
    input.value = text;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  };

  it('notes an amount it cannot read for the part it fills, named by its label', async () => {
    await type('-5');
    expect(emitted).toEqual([undefined]);
    expect([...typing.byPart()]).toEqual([
      ['amountMinor', 'Most they would pay: "-5" is not an amount; type digits, e.g. 12.50'],
    ]);
    expect((fixture.nativeElement as HTMLElement).querySelector('.bv-error')?.textContent).toBe(
      '"-5" is not an amount; type digits, e.g. 12.50',
    );
  });

  it('drops the note once the amount reads, is cleared, or the field goes', async () => {
    await type('-5');
    await type('1,200');
    expect(emitted).toEqual([undefined, 120000]);
    expect(typing.byPart().size).toBe(0);
    await type('-5');
    await type('');
    expect(typing.byPart().size).toBe(0);
    await type('-5');
    fixture.destroy();
    expect(typing.byPart().size).toBe(0);
  });

  it('uses the short name given for messages in place of a long label', async () => {
    fixture.componentRef.setInput('name', 'Bargain price');
    await type('1,5');
    expect(typing.byPart().get('amountMinor')).toMatch(/^Bargain price: "1,5" is not an amount/);
  });
});
