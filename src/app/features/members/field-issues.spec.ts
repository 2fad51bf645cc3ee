import { sortIssues } from './field-issues';

describe('sortIssues', () => {
  it('places nested paths on their top field and keeps the rest for the form', () => {
    const sorted = sortIssues(
      [
        { path: 'roles.1', message: 'A role is listed twice' },
        { path: 'email', message: 'Enter a valid e-mail address' },
        { path: 'email', message: 'Second message about e-mail' },
        { path: '', message: 'Unknown key: nickname' },
      ],
      ['name', 'email', 'roles'],
    );
    expect(sorted.byField).toEqual({
      roles: 'A role is listed twice',
      email: 'Enter a valid e-mail address',
    });
    expect(sorted.unplaced).toEqual(['Unknown key: nickname']);
  });
});
