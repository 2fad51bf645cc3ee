import type { ApiProblem } from '../../../core/api-problem';
import { issuesBeyondMessage, publishedNotice } from './publish-notice';

describe('publishedNotice', () => {
  it('writes plain plurals, never "client(s)"', () => {
    expect(publishedNotice(1, 1)).toBe('Version 1 published; 1 client told by e-mail.');
    expect(publishedNotice(2, 2)).toBe('Version 2 published; 2 clients told by e-mail.');
    expect(publishedNotice(3, 0)).toBe('Version 3 published; the study has no client to tell.');
  });
});

describe('issuesBeyondMessage', () => {
  const problem = (message: string, issues: ApiProblem['issues']): ApiProblem => ({
    status: 400,
    code: 'invalid-input',
    message,
    issues,
  });

  it('does not list a field message that the refusal already says', () => {
    const refusal = problem('Give the schedule a title.', [
      { path: 'title', message: 'Give the schedule a title' },
    ]);
    expect(issuesBeyondMessage(refusal)).toEqual([]);
  });

  it('lists the cells a summary refusal names only in its issues', () => {
    const cell = {
      path: 'price:2950',
      message: 'At KES 2,950 the schedule rests on 0 respondents',
    };
    const refusal = problem('1 price of the schedule rests on fewer than 5 respondents.', [cell]);
    expect(issuesBeyondMessage(refusal)).toEqual([cell]);
  });
});
