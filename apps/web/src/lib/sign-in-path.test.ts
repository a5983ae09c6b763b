import { describe, expect, it } from 'vitest';

import { safeRedirectTarget, signInPath } from './sign-in-path';

describe('safeRedirectTarget(raw)', () => {
  it.each([
    ['/users?page=2', '/users?page=2'],
    ['/product-lines', '/product-lines'],
    [null, '/'],
    ['', '/'],
    ['https://evil.example/', '/'],
    ['//evil.example/path', '/'],
    ['/\\evil.example', '/'],
    ['/sign-in', '/'],
    ['/sign-in?redirectTo=%2Fusers', '/'],
    ['users', '/'],
  ])('safeRedirectTarget(%j) is %j', (raw, expected) => {
    expect(safeRedirectTarget(raw)).toBe(expected);
  });
});

describe('signInPath(from)', () => {
  it('keeps the page the user wanted, encoded', () => {
    expect(signInPath('/users?page=2')).toBe('/sign-in?redirectTo=%2Fusers%3Fpage%3D2');
  });

  it('adds nothing for the home page or an unsafe target', () => {
    expect(signInPath('/')).toBe('/sign-in');
    expect(signInPath('//evil.example')).toBe('/sign-in');
    expect(signInPath(undefined)).toBe('/sign-in');
  });
});
