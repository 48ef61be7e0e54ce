import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiError } from './ApiError';
import { parseOrThrow } from './validation';

const Body = z.object({
  email: z.email({ error: 'must be an e-mail address' }),
  cells: z.array(z.object({ id: z.string().min(1, { error: 'must not be empty' }) })),
  note: z.string().optional(),
});

function messageOf(fn: () => unknown): { status: number; code: string; message: string } {
  try {
    fn();
  } catch (error) {
    if (error instanceof ApiError) return { status: error.status, code: error.code, message: error.message };
    throw error;
  }
  throw new Error('expected a validation error');
}

describe('parseOrThrow', () => {
  it('returns the parsed value', () => {
    expect(parseOrThrow(Body, { email: 'lug@northgate.test', cells: [{ id: 'k1' }] }, 'body')).toEqual({
      email: 'lug@northgate.test',
      cells: [{ id: 'k1' }],
    });
  });

  it('names every field at fault by its path, and says "is required" for missing ones', () => {
    expect(messageOf(() => parseOrThrow(Body, { email: 'nope', cells: [{ id: '' }, {}] }, 'body'))).toEqual({
      status: 400,
      code: 'invalid-field',
      message: 'email: must be an e-mail address; cells.0.id: must not be empty; cells.1.id: is required',
    });
  });

  it('names the root when the whole value is wrong', () => {
    expect(messageOf(() => parseOrThrow(Body, 'a string', 'body')).message).toMatch(/^body: /);
  });
});
