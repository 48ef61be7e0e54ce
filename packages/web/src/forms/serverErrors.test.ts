import { describe, expect, it } from 'vitest';
import { ApiError } from '../api/ApiError';
import { splitServerError } from './serverErrors';

const LABELS = { email: 'E-mail', password: 'Password' };

describe('splitServerError', () => {
  it('puts each named field’s problem beside that field, in the form’s own words', () => {
    const error = new ApiError(
      400,
      'invalid-field',
      'email: must be an e-mail address; password: must be at least 10 characters',
    );
    expect(splitServerError(error, LABELS)).toEqual({
      field: {
        email: 'E-mail must be an e-mail address',
        password: 'Password must be at least 10 characters',
      },
      form: null,
    });
  });

  it('keeps problems with fields the form does not show above the form', () => {
    const error = new ApiError(400, 'invalid-field', 'email: is required; captcha: is required');
    expect(splitServerError(error, LABELS)).toEqual({
      field: { email: 'E-mail is required' },
      form: 'captcha: is required',
    });
  });

  it('shows any other refusal above the form', () => {
    const error = new ApiError(429, 'rate-limited', 'too many attempts, wait a minute');
    expect(splitServerError(error, LABELS)).toEqual({
      field: {},
      form: 'too many attempts, wait a minute',
    });
  });

  it('has nothing to show without an error', () => {
    expect(splitServerError(null, LABELS)).toEqual({ field: {}, form: null });
  });
});
