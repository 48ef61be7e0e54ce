import { describe, expect, it } from 'vitest';
import {
  checkEmail,
  checkPassword,
  checkProjectCode,
  checkRequired,
  collectErrors,
} from './validators';

describe('field checks', () => {
  it('accepts ordinary addresses and names the field when one is malformed', () => {
    expect(checkEmail('alice@hoist-works.test')).toBeUndefined();
    expect(checkEmail('  alice@hoist-works.test  ')).toBeUndefined();
    expect(checkEmail('')).toBe('E-mail is required.');
    expect(checkEmail('alice@hoist')).toBe('E-mail must be an address like name@example.com.');
    expect(checkEmail('alice hoist@works.test', 'Work e-mail')).toBe(
      'Work e-mail must be an address like name@example.com.',
    );
  });

  it('wants passwords of at least 10 characters and says how long the given one is', () => {
    expect(checkPassword('0123456789')).toBeUndefined();
    expect(checkPassword('012345678')).toBe('Password must be at least 10 characters (it has 9).');
    expect(checkPassword('', 'New password')).toBe('New password is required.');
  });

  it('treats blank text as missing', () => {
    expect(checkRequired('   ', 'Sheet title')).toBe('Sheet title is required.');
    expect(checkRequired('Lug', 'Sheet title')).toBeUndefined();
  });

  it('checks project codes the way the server does, ignoring case', () => {
    expect(checkProjectCode('')).toBeUndefined();
    expect(checkProjectCode('gbl')).toBeUndefined();
    expect(checkProjectCode('HD-2')).toBeUndefined();
    expect(checkProjectCode('G')).toMatch(/^Project code must be 2 to 16/);
    expect(checkProjectCode('-GBL')).toMatch(/^Project code must/);
    expect(checkProjectCode('GBL 1')).toMatch(/^Project code must/);
  });

  it('collects only the failed checks', () => {
    expect(collectErrors({ email: undefined, password: 'Password is required.' })).toEqual({
      password: 'Password is required.',
    });
  });
});
