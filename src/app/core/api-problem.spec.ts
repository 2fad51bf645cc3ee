import { HttpErrorResponse } from '@angular/common/http';
import { readApiProblem } from './api-problem';

function response(status: number, error: unknown): HttpErrorResponse {
  return new HttpErrorResponse({ status, error, url: '/api/x' });
}

describe('readApiProblem', () => {
  it('reads code, message and field issues from the API error body', () => {
    const problem = readApiProblem(
      response(400, {
        error: {
          code: 'invalid-request',
          message: 'Some fields need attention.',
          issues: [{ path: 'email', message: 'Enter a valid e-mail address' }],
        },
      }),
    );
    expect(problem).toEqual({
      status: 400,
      code: 'invalid-request',
      message: 'Some fields need attention.',
      issues: [{ path: 'email', message: 'Enter a valid e-mail address' }],
    });
  });

  it('explains a lost connection in plain words', () => {
    expect(readApiProblem(response(0, new ProgressEvent('error'))).message).toMatch(/cannot reach/);
  });

  it('says the device is offline when a request fails with no network', () => {
    vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(false);
    const offline =
      'This device is offline. Fieldcurve will load this once the connection is back.';
    expect(readApiProblem(response(0, new ProgressEvent('error')))).toMatchObject({
      code: 'network',
      message: offline,
    });
    // The service worker's own answer to a request it could not send.
    expect(readApiProblem(response(504, null)).message).toBe(offline);
    vi.restoreAllMocks();
  });

  it('does not blame the server for a gateway time-out with no body', () => {
    expect(readApiProblem(response(504, null)).message).toMatch(/cannot reach/);
    expect(readApiProblem(response(500, null)).message).toBe(
      'The server ran into a problem. Try again in a moment.',
    );
  });

  it('words a role refusal plainly, without naming roles', () => {
    const refusal = (message: string) =>
      readApiProblem(response(403, { error: { code: 'forbidden', message } })).message;
    expect(refusal('This is open to researchers, supervisors and enumerators only.')).toBe(
      'This page is not open to your account.',
    );
    expect(refusal('This is open to supervisors only in this study.')).toBe(
      'This page is not open to your account in this study.',
    );
    expect(refusal('Only the study’s supervisors may assign routes.')).toBe(
      'Only the study’s supervisors may assign routes.',
    );
  });

  it('falls back to the status when the body is not an API error', () => {
    expect(readApiProblem(response(418, '<html>')).message).toBe('The request failed (HTTP 418).');
    expect(readApiProblem(response(403, null)).message).toBe(
      'Your roles do not allow this action.',
    );
  });

  it('ignores a body whose issues are malformed', () => {
    const problem = readApiProblem(
      response(400, { error: { code: 'x', message: 'y', issues: [{ path: 3 }] } }),
    );
    expect(problem.code).toBe('http-400');
  });
});
