import { ComponentFixture, TestBed } from '@angular/core/testing';
import { RespondentReference } from './respondent-reference';

describe('RespondentReference', () => {
  let fixture: ComponentFixture<RespondentReference>;
  let element: HTMLElement;
  let typed: string[];

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [RespondentReference] });
    fixture = TestBed.createComponent(RespondentReference);
    element = fixture.nativeElement as HTMLElement;
    typed = [];
    fixture.componentInstance.referenceChange.subscribe((value) => typed.push(value));
    await fixture.whenStable();
  });

  const field = () => element.querySelector<HTMLInputElement>('input')!;
  const state = () =>
    element.querySelector('#respondent-reference-state')!.textContent.replace(/\s+/g, ' ').trim();

  it('labels the input and explains that only a one-way code is kept', () => {
    const label = element.querySelector(`label[for="${field().id}"]`);
    expect(label?.textContent?.trim()).toBe('Respondent reference (optional)');
    const hint = element.querySelector(
      `#${field().getAttribute('aria-describedby')!.split(' ')[0]}`,
    );
    expect(hint?.textContent).toContain('one-way code');
    expect(hint?.textContent).toContain('never saved or sent as typed');
    expect(field().getAttribute('autocomplete')).toBe('off');
  });

  it('passes on every change of the text, and nothing else', () => {
    field().value = 'HH-0042';
    field().dispatchEvent(new Event('input'));
    expect(typed).toEqual(['HH-0042']);
  });

  it('shows the problem beside the input and marks it invalid', async () => {
    fixture.componentRef.setInput('problem', 'Respondent reference: type at least 4');
    await fixture.whenStable();
    expect(state()).toBe('Respondent reference: type at least 4');
    expect(field().getAttribute('aria-invalid')).toBe('true');
  });

  it('says a kept code can be replaced, and removes it on request', async () => {
    fixture.componentRef.setInput('kept', true);
    await fixture.whenStable();
    expect(state()).toContain('Kept as a one-way code. Type again to replace it.');
    field().value = 'HH-0042';
    element.querySelector<HTMLButtonElement>('.reference__remove')!.click();
    expect(field().value).toBe('');
    expect(typed).toEqual(['']);
  });
});
