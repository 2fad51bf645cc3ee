import { safeReturnPath, signInHref } from './sign-in-link';

describe('signInHref', () => {
  it('sends the person back to the page they asked for', () => {
    expect(signInHref('/members?tab=2')).toBe('/auth/sign-in?returnTo=%2Fmembers%3Ftab%3D2');
  });

  it.each(['https://elsewhere.example/', '//elsewhere.example', '/\\elsewhere.example', '', null])(
    'refuses %s as a place to return to',
    (candidate) => {
      expect(safeReturnPath(candidate)).toBe('/');
    },
  );
});
