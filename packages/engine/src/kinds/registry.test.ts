/**
 * One test over every kind (STYLE: an explicit registry): unique ids, the schema rejects
 * garbage, and evaluate returns an error value — never a throw — on fuzzed input.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createEvaluator } from '../sheet/createEvaluator';
import { KIND_IDS, type KindId } from './kindIds';
import { KINDS, cellSchema } from './registry';
import { CELL_ERROR_CODES, type CellResult } from './result';

/** A valid cell of each kind, with `expr` standing in for every expression field. */
function cellOf(kind: KindId, expr: string): Record<string, unknown> {
  const strength = { Sy: expr, Sut: expr, Suc: expr, c: expr, phi: expr };
  switch (kind) {
    case 'note':
      return { id: 'x', kind, text: expr };
    case 'quantity':
      return { id: 'x', kind, name: 'X', expr };
    case 'stress':
      return { id: 'x', kind, name: 'X', sx: expr, sy: expr, txy: expr, sz: expr };
    case 'rosette':
      return { id: 'x', kind, name: 'X', layout: 'angles', angles: [expr, expr, expr], ea: expr, eb: expr, ec: expr, E: expr, nu: expr };
    case 'rotate':
      return { id: 'x', kind, name: 'X', of: 'S', angle: expr };
    case 'principal':
      return { id: 'x', kind, name: 'X', of: 'S' };
    case 'criterion':
      return { id: 'x', kind, name: 'X', of: 'S', theory: 'mohr-coulomb', strength, required: expr };
    case 'pointset':
      return { id: 'x', kind, name: 'X', source: { rows: [[1, 2, 3]] }, columns: { sx: 0, sy: 1, txy: 2 }, theory: 'tresca', strength, required: expr };
  }
}

const STATE = { id: 's', kind: 'stress', name: 'S', sx: '80 MPa', sy: '-40 MPa', txy: '25 MPa' };

function evaluateWithState(cell: Record<string, unknown>): CellResult {
  const ev = createEvaluator({ cells: [STATE, cell as never] });
  return ev.results.get('x')!;
}

function expectWellFormed(r: CellResult): void {
  if (r.ok) {
    for (const v of Object.values(r.values)) {
      if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
    }
  } else {
    expect(CELL_ERROR_CODES).toContain(r.error.code);
    expect(r.error.cellId).toBe('x');
    expect(r.error.message.length).toBeGreaterThan(0);
  }
}

/** Expressions that cannot be valid: an unbalanced bracket or a stray operator. */
const garbage = fc.oneof(
  fc.string().map((s) => `(${s}`),
  fc.string().map((s) => `${s} +* 2`),
  fc.constantFrom('@@', '1 MPa +', 'evaluate("1")', 'import({})', 'a = 1', '1; 2', '][', '"text"', 'true', '[1, 2]', 'sqrt(-1 MPa^2)', '1/0'),
);

/** Expressions from pieces of the language: may or may not evaluate, must never throw. */
const token = fc.constantFrom('1', '2.5', '-3', 'MPa', 'ksi', 'kN', 'mm', 'deg', 'S', 'S.sx', 'pi', '+', '-', '*', '/', '^', '(', ')', 'sqrt(', 'max(', ',', ' ', 'e', 'X', '1e-4', 'foo');
const fuzzed = fc.array(token, { maxLength: 12 }).map((parts) => parts.join(' '));

describe('the kind registry', () => {
  it('lists every kind once, under its own id', () => {
    expect(Object.keys(KINDS).sort()).toEqual([...KIND_IDS].sort());
    for (const id of KIND_IDS) expect(KINDS[id].id).toBe(id);
    expect(new Set(KIND_IDS).size).toBe(KIND_IDS.length);
  });

  for (const kind of KIND_IDS) {
    describe(kind, () => {
      it('accepts a well-formed cell', () => {
        expect(KINDS[kind].schema.safeParse(cellOf(kind, '1')).success).toBe(true);
        expect(cellSchema.safeParse(cellOf(kind, '1')).success).toBe(true);
      });

      it('its schema rejects garbage', () => {
        fc.assert(
          fc.property(fc.anything(), (junk) => {
            const isCell = typeof junk === 'object' && junk !== null && (junk as { kind?: unknown }).kind === kind;
            fc.pre(!isCell);
            expect(KINDS[kind].schema.safeParse(junk).success).toBe(false);
          }),
        );
        fc.assert(
          fc.property(fc.dictionary(fc.string(), fc.anything()), (fields) => {
            const cell = { ...cellOf(kind, '1'), ...fields, id: 7 };
            expect(KINDS[kind].schema.safeParse(cell).success).toBe(false);
          }),
          { numRuns: 50 },
        );
      });

      it('evaluate returns an error value on garbage input', () => {
        // Garbage in every expression field; a principal cell has none, so its `of` gets it, and
        // a note's text can only be wrong by type.
        const garbageCell = (expr: string) =>
          kind === 'principal' ? { ...cellOf(kind, '1'), of: expr } : kind === 'note' ? { ...cellOf(kind, '1'), text: [expr] } : cellOf(kind, expr);
        fc.assert(
          fc.property(garbage, (expr) => {
            const r = evaluateWithState(garbageCell(expr));
            expect(r.ok).toBe(false);
            expectWellFormed(r);
          }),
          { numRuns: 60 },
        );
      });

      it('evaluate never throws on fuzzed expressions and returns a well-formed result', () => {
        fc.assert(
          fc.property(fuzzed, (expr) => {
            expectWellFormed(evaluateWithState(cellOf(kind, expr)));
          }),
          { numRuns: 80 },
        );
      });

      it('evaluate turns a cell that fails its schema into invalid-field naming a field', () => {
        const r = evaluateWithState({ ...cellOf(kind, '1'), id: 'x', bogus: 1 });
        expect(r).toMatchObject({ ok: false, error: { code: 'invalid-field', message: 'unknown field "bogus"' } });
      });
    });
  }

  it('an unknown kind is an invalid-field error naming kind', () => {
    const r = evaluateWithState({ id: 'x', kind: 'beam', name: 'B' });
    expect(r).toMatchObject({ ok: false, kind: null, error: { code: 'invalid-field', message: expect.stringMatching(/^kind: /) } });
  });
});
