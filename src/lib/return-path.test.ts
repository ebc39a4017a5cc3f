import { describe, expect, it } from 'vitest';
import { safeReturnPath, signInPath } from './return-path';

describe('returning after sign-in', () => {
  it('returns to a path inside Motifold, with its query', () => {
    expect(safeReturnPath('/members?tab=invitations')).toBe('/members?tab=invitations');
  });

  // Browsers read "//host" and "/\host" as another host (WHATWG URL Standard, special-scheme
  // parsing treats "\" like "/"), so these would be open redirects.
  it.each(['//evil.test/', '/\\evil.test', 'https://evil.test/', 'javascript:alert(1)', '', null])(
    'refuses %s and goes home instead',
    (value) => {
      expect(safeReturnPath(value)).toBe('/');
    },
  );

  it('builds the sign-in link with an encoded return path, and none for home', () => {
    expect(signInPath('/members?x=1')).toBe('/sign-in?returnTo=%2Fmembers%3Fx%3D1');
    expect(signInPath('/')).toBe('/sign-in');
  });
});
