import { describe, expect, it } from 'vitest';
import { paths, safeNextPath } from './paths';

describe('safeNextPath', () => {
  it.each([
    ['/account', '/account'],
    ['/admin/users?q=kim', '/admin/users?q=kim'],
    [null, '/'],
    ['', '/'],
    ['https://elsewhere.example/', '/'],
    ['//elsewhere.example/', '/'],
    ['/\\elsewhere.example', '/'],
    ['javascript:alert(1)', '/'],
  ])('maps %s to %s', (input, expected) => {
    expect(safeNextPath(input)).toBe(expected);
  });
});

describe('paths.signIn.href', () => {
  it('encodes where to go next', () => {
    expect(paths.signIn.href('/admin/users?q=a b')).toBe(
      '/sign-in?next=%2Fadmin%2Fusers%3Fq%3Da%20b',
    );
    expect(paths.signIn.href()).toBe('/sign-in');
  });
});
