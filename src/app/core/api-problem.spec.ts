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
