import { TestBed } from '@angular/core/testing';
import { MatDialogRef } from '@angular/material/dialog';
import { LeaveDialog } from './leave-dialog';

describe('LeaveDialog', () => {
  const close = vi.fn();

  async function render() {
    close.mockReset();
    TestBed.configureTestingModule({
      imports: [LeaveDialog],
      providers: [{ provide: MatDialogRef, useValue: { close } }],
    });
    const fixture = TestBed.createComponent(LeaveDialog);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const button = (name: RegExp) =>
      Array.from(element.querySelectorAll('button')).find((b) => name.test(b.textContent ?? ''))!;
    return { element, button };
  }

  it('says that unsaved changes will be lost', async () => {
    const { element } = await render();
    expect(element.textContent).toContain('Leave without saving?');
    expect(element.textContent).toContain('they are lost');
  });

  it('closes with true only for discarding', async () => {
    const { button } = await render();
    button(/Discard changes and leave/).click();
    expect(close).toHaveBeenLastCalledWith(true);
    button(/Stay and keep editing/).click();
    expect(close).toHaveBeenLastCalledWith(false);
  });
});
