import { describe, expect, it } from 'vitest';
import { safeNextPath, signInPathFor } from './safeNextPath';

describe('safeNextPath', () => {
  it('keeps in-app paths', () => {
    expect(safeNextPath('/invite/abc?x=1')).toBe('/invite/abc?x=1');
  });

  it.each([
    '//elsewhere.test/x',
    '/\\elsewhere.test',
    'https://elsewhere.test',
    'javascript:alert(1)',
    '',
    null,
  ])('refuses %s and falls back', (next) => {
    expect(safeNextPath(next, '/sheets')).toBe('/sheets');
  });
});

describe('signInPathFor', () => {
  it('carries the current page as next, except for the home page and the sign-in page itself', () => {
    expect(signInPathFor('/projects?x=1')).toBe('/signin?next=%2Fprojects%3Fx%3D1');
    expect(signInPathFor('/')).toBe('/signin');
    expect(signInPathFor('/signin?next=%2Fsheets')).toBe('/signin');
  });
});
