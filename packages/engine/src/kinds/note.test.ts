import { describe, expect, it } from 'vitest';
import { makeSheet } from '../test/makeSheet';
import { noteCellSchema } from './note';

describe('note', () => {
  it('evaluates to an empty result and has no equation', () => {
    const ev = makeSheet([{ id: 'n1', kind: 'note', text: 'Load case LC2, $F = 18\\,kN$' }]);
    expect(ev.results.get('n1')).toEqual({ ok: true, cellId: 'n1', kind: 'note', values: {}, measures: {} });
    expect(ev.equation('n1', 'SI')).toBeNull();
  });

  it('bad input: missing text, wrong type, unknown field → invalid-field naming the field', () => {
    const ev = makeSheet([
      { id: 'a', kind: 'note' },
      { id: 'b', kind: 'note', text: 5 },
      { id: 'c', kind: 'note', text: 'x', name: 'N' },
    ]);
    const err = (id: string) => {
      const r = ev.results.get(id)!;
      return r.ok ? null : r.error;
    };
    expect(err('a')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^text: /) });
    expect(err('b')).toMatchObject({ code: 'invalid-field', message: 'text: must be a string' });
    expect(err('c')).toMatchObject({ code: 'invalid-field', message: 'unknown field "name"' });
    expect(noteCellSchema.safeParse({ id: 'x', kind: 'note', text: '' }).success).toBe(true);
  });
});
