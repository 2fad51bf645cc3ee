import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Notices } from './notices';

describe('Notices', () => {
  it('loads the snack bar on the first notice and opens each notice on it', async () => {
    const bar = TestBed.inject(MatSnackBar);
    const open = vi.spyOn(bar, 'open').mockReturnValue(undefined as never);
    const notices = TestBed.inject(Notices);
    notices.show('The study is locked.');
    notices.show('Try again in a moment.');
    expect(open).not.toHaveBeenCalled(); // the snack bar's code is still loading
    await vi.waitFor(() => expect(open).toHaveBeenCalledTimes(2));
    expect(open).toHaveBeenNthCalledWith(1, 'The study is locked.', 'Close', { duration: 8000 });
    expect(open).toHaveBeenNthCalledWith(2, 'Try again in a moment.', 'Close', { duration: 8000 });
  });
});
