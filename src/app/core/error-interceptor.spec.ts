import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { signInAs } from '../testing/sign-in-as';
import { withoutErrorNotice } from './error-notice-context';
import { errorInterceptor } from './error-interceptor';
import { Notices } from './notices';
import { Session } from './session';

describe('errorInterceptor', () => {
  let http: HttpClient;
  let server: HttpTestingController;
  const show = vi.fn();

  beforeEach(() => {
    show.mockReset();
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        provideRouter([]),
        { provide: Notices, useValue: { show } },
      ],
    });
    http = TestBed.inject(HttpClient);
    server = TestBed.inject(HttpTestingController);
  });

  afterEach(() => server.verify());

  function failWith(status: number, body: object | null, quiet = false): unknown {
    let received: unknown;
    const options = quiet ? { context: withoutErrorNotice() } : {};
    http.get('/api/things', options).subscribe({ error: (error: unknown) => (received = error) });
    server.expectOne('/api/things').flush(body, { status, statusText: 'Failed' });
    return received;
  }

  it('shows the message from the API error body and still hands the error on', async () => {
    await signInAs(['admin']);
    const body = {
      error: { code: 'study-locked', message: 'This study is published and locked.' },
    };
    expect(failWith(409, body)).toBeDefined();
    expect(show).toHaveBeenCalledWith('This study is published and locked.');
  });

  it('explains a server failure that came without a body', async () => {
    await signInAs(['admin']);
    failWith(503, null);
    expect(show.mock.calls[0][0]).toBe('The server ran into a problem. Try again in a moment.');
  });

  it('stays quiet when the caller shows the error itself', async () => {
    await signInAs(['admin']);
    failWith(400, { error: { code: 'invalid', message: 'Bad', issues: [] } }, true);
    expect(show).not.toHaveBeenCalled();
  });

  it('turns a 401 into the signed-out state and goes to the welcome page', async () => {
    await signInAs(['admin']);
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    failWith(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } }, true);
    expect(TestBed.inject(Session).current().status).toBe('signed-out');
    expect(show.mock.calls[0][0]).toContain('Your session has ended');
    expect(navigate).toHaveBeenCalledWith(['/welcome'], { queryParams: { returnTo: '/' } });
  });

  it('says why when the session was ended from elsewhere', async () => {
    await signInAs(['enumerator']);
    vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    const message = 'This device was signed out by an administrator or supervisor.';
    failWith(401, { error: { code: 'session-ended', message } }, true);
    expect(show).toHaveBeenCalledWith(message);
  });
});
