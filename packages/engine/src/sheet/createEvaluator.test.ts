import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CellResult } from '../kinds/result';
import { createEvaluator, type CellInput } from './createEvaluator';

const q = (id: string, name: string, expr: string): CellInput => ({ id, kind: 'quantity', name, expr });
const errorOf = (r: CellResult | undefined) => (r && !r.ok ? r.error : null);


/** A number of an ok result (fails the test otherwise). */
function numberOf(r: CellResult | undefined, key: string): number {
  if (!r || !r.ok) throw new Error(`expected a value, got ${JSON.stringify(r)}`);
  return r.values[key] as number;
}

describe('cycles', () => {
  it('every cell of a cycle gets a cycle error; cells downstream get upstream; the rest evaluates', () => {
    const ev = createEvaluator({
      cells: [
        q('a', 'A', 'B + 1 kN'),
        q('b', 'B', 'C * 2'),
        q('c', 'C', 'A / 2'),
        q('d', 'D', 'A + 1 kN'),
        q('e', 'E', '5 kN'),
        q('f', 'F', 'F + 1'),
      ],
    });
    for (const id of ['a', 'b', 'c']) {
      expect(errorOf(ev.results.get(id))).toMatchObject({ code: 'cycle', cellId: id, message: expect.stringContaining('A → B → C → A') });
    }
    expect(errorOf(ev.results.get('d'))).toMatchObject({ code: 'upstream', rootCellId: 'a', message: expect.stringMatching(/^expr: A has an error \(cycle\)/) });
    expect(ev.results.get('e')).toMatchObject({ ok: true, values: { value: 5000 } });
    expect(errorOf(ev.results.get('f'))).toMatchObject({ code: 'cycle', message: 'expr: reference cycle F → F' });
  });

  it('breaking the cycle re-evaluates its former members', () => {
    const ev = createEvaluator({ cells: [q('a', 'A', 'B + 1 kN'), q('b', 'B', 'A * 2'), q('c', 'C', 'B')] });
    expect(errorOf(ev.results.get('a'))?.code).toBe('cycle');
    const report = ev.update(q('b', 'B', '3 kN'));
    expect(new Set(report.evaluated)).toEqual(new Set(['a', 'b', 'c']));
    expect(ev.results.get('a')).toMatchObject({ ok: true, values: { value: 4000 } });
    expect(ev.results.get('c')).toMatchObject({ ok: true, values: { value: 3000 } });
  });

  it('a cycle through `of` references', () => {
    const ev = createEvaluator({
      cells: [
        { id: 's', kind: 'stress', name: 'S', sx: 'R.sx', sy: '0 MPa', txy: '0 MPa' },
        { id: 'r', kind: 'rotate', name: 'R', of: 'S', angle: '10 deg' },
      ],
    });
    expect(errorOf(ev.results.get('s'))).toMatchObject({ code: 'cycle', message: 'sx: reference cycle S → R → S' });
    expect(errorOf(ev.results.get('r'))).toMatchObject({ code: 'cycle', message: 'of: reference cycle S → R → S' });
  });
});

describe('unknown names and upstream errors', () => {
  it('an unknown name errors only the cell that uses it; dependents point at the root cause', () => {
    const ev = createEvaluator({
      cells: [
        q('a', 'A', 'Fx / 2'),
        q('b', 'B', 'A * 3'),
        { id: 's', kind: 'stress', name: 'S', sx: 'B / (10 mm^2)', sy: '0 MPa', txy: '0 MPa' },
        { id: 'p', kind: 'principal', name: 'P', of: 'S' },
        q('z', 'Z', '2 MPa'),
      ],
    });
    expect(errorOf(ev.results.get('a'))).toEqual({ code: 'unknown-name', message: 'expr: no cell named "Fx"', cellId: 'a' });
    expect(errorOf(ev.results.get('b'))).toMatchObject({ code: 'upstream', cellId: 'b', rootCellId: 'a' });
    expect(errorOf(ev.results.get('s'))).toMatchObject({ code: 'upstream', cellId: 's', rootCellId: 'a', message: expect.stringMatching(/^sx: B has an error upstream; see cell a/) });
    expect(errorOf(ev.results.get('p'))).toMatchObject({ code: 'upstream', rootCellId: 'a' });
    expect(ev.results.get('z')!.ok).toBe(true);
  });

  it('adding the missing cell fixes the chain', () => {
    const ev = createEvaluator({ cells: [q('a', 'A', 'Fx / 2'), q('b', 'B', 'A * 3')] });
    const report = ev.update(q('f', 'Fx', '10 kN'));
    expect(report.evaluated).toEqual(['f', 'a', 'b']);
    expect(ev.results.get('b')).toMatchObject({ ok: true, values: { value: 15000 } });
  });

  it('a cell named like a unit shadows the unit only where referenced', () => {
    const ev = createEvaluator({ cells: [q('a', 'A', '40 mm * 12 mm'), q('f', 'F', '18 kN'), q('s', 'sigma', 'F / A'), q('i', 'I', '2 A')] });
    expect(ev.results.get('s')).toMatchObject({ ok: true });
    expect(numberOf(ev.results.get('s'), 'value')).toBeCloseTo(37.5e6, 6);
    // `2 A` is twice the cell A (an area), not two amperes.
    expect(numberOf(ev.results.get('i'), 'value')).toBeCloseTo(9.6e-4, 12);
  });

  it('duplicate names error both cells; references to the name report upstream', () => {
    const ev = createEvaluator({ cells: [q('a', 'L', '1 m'), q('b', 'L', '2 m'), q('c', 'M', 'L * 2')] });
    expect(errorOf(ev.results.get('a'))).toMatchObject({ code: 'duplicate-name', message: 'name: another cell (b) is also named "L"' });
    expect(errorOf(ev.results.get('b'))).toMatchObject({ code: 'duplicate-name' });
    expect(errorOf(ev.results.get('c'))).toMatchObject({ code: 'upstream', rootCellId: 'a' });
    ev.update(q('b', 'L2', '2 m'));
    expect(ev.results.get('a')!.ok).toBe(true);
    expect(ev.results.get('c')).toMatchObject({ ok: true, values: { value: 2 } });
  });
});

/** A chain of groups: load -> stress -> principal -> criterion, per group; groups independent. */
function groups(n: number): CellInput[] {
  const cells: CellInput[] = [q('E', 'Sy', '250 MPa')];
  for (let i = 0; i < n; i++) {
    cells.push(q(`f${i}`, `F${i}`, `${10 + i} kN`));
    cells.push({ id: `s${i}`, kind: 'stress', name: `S${i}`, sx: `F${i} / (100 mm^2)`, sy: '0 MPa', txy: '20 MPa' });
    cells.push({ id: `p${i}`, kind: 'principal', name: `P${i}`, of: `S${i}` });
    cells.push({ id: `c${i}`, kind: 'criterion', name: `C${i}`, of: `S${i}`, theory: 'von-mises', strength: { Sy: 'Sy' } });
  }
  return cells;
}

describe('incremental re-evaluation', () => {
  it('an edit re-evaluates only the edited cell and what depends on it', () => {
    const ev = createEvaluator({ cells: groups(5) });
    expect(ev.evaluations).toBe(21);
    const before = ev.evaluations;
    const report = ev.update(q('f2', 'F2', '50 kN'));
    expect(report.evaluated).toEqual(['f2', 's2', 'p2', 'c2']);
    expect(ev.evaluations - before).toBe(4);
    expect(numberOf(ev.results.get('s2'), 'sx')).toBeCloseTo(500e6, 3);
    // A shared input re-evaluates every criterion and nothing else.
    const shared = ev.update(q('E', 'Sy', '300 MPa'));
    expect(shared.evaluated).toEqual(['E', 'c0', 'c1', 'c2', 'c3', 'c4']);
  });

  it('an unchanged cell is not re-evaluated', () => {
    const ev = createEvaluator({ cells: groups(2) });
    const before = ev.evaluations;
    expect(ev.update(q('f1', 'F1', '11 kN'))).toEqual({ evaluated: [] });
    expect(ev.evaluations).toBe(before);
  });

  it('rename, remove and insert touch the cells that referred to either name', () => {
    const ev = createEvaluator({ cells: groups(2) });
    const renamed = ev.update(q('f1', 'G1', '11 kN'));
    expect(renamed.evaluated).toEqual(['f1', 's1', 'p1', 'c1']);
    expect(errorOf(ev.results.get('s1'))).toMatchObject({ code: 'unknown-name', message: 'sx: no cell named "F1"' });
    const removed = ev.remove('s0');
    expect(removed.evaluated).toEqual(['p0', 'c0']);
    expect(errorOf(ev.results.get('p0'))).toMatchObject({ code: 'unknown-name', message: 'of: no cell named "S0"' });
    expect(ev.results.has('s0')).toBe(false);
    const inserted = ev.insert({ id: 's0', kind: 'stress', name: 'S0', sx: '1 MPa', sy: '0 MPa', txy: '0 MPa' }, 2);
    expect(inserted.evaluated).toEqual(['s0', 'p0', 'c0']);
    expect([...ev.results.keys()].slice(0, 4)).toEqual(['E', 'f0', 's0', 'p0']);
  });

  it('an edit that leaves a cell invalid gives invalid-field there and upstream below', () => {
    const ev = createEvaluator({ cells: groups(1) });
    ev.update({ id: 's0', kind: 'stress', name: 'S0', sx: 'F0 / (100 mm^2)', txy: '0 MPa' });
    expect(errorOf(ev.results.get('s0'))).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^sy: /) });
    expect(errorOf(ev.results.get('c0'))).toMatchObject({ code: 'upstream', rootCellId: 's0' });
  });
});

describe('determinism', () => {
  it('the same sheet gives the same results, evaluated twice', () => {
    const a = createEvaluator({ cells: groups(6) });
    const b = createEvaluator({ cells: groups(6) });
    expect([...b.results]).toEqual([...a.results]);
  });

  it('any sequence of edits ends in the same results as evaluating the final sheet from scratch', () => {
    const names = ['A', 'B', 'C', 'D'];
    const exprs = fc.constantFrom('1 kN', '2 kN', 'A + 1 kN', 'B * 2', 'C - A', 'D / 2', 'A + B', 'Q', '1 +', 'sqrt(A / (1 kN)) * 1 kN');
    const edit = fc.record({ id: fc.constantFrom('a', 'b', 'c', 'd', 'e'), name: fc.constantFrom(...names), expr: exprs, remove: fc.boolean() });
    fc.assert(
      fc.property(fc.array(edit, { maxLength: 12 }), (edits) => {
        const ev = createEvaluator({ cells: [q('a', 'A', '1 kN'), q('b', 'B', 'A * 2'), q('c', 'C', 'B + A')] });
        for (const e of edits) {
          if (e.remove) ev.remove(e.id);
          else ev.update(q(e.id, e.name, e.expr));
        }
        const fresh = createEvaluator({ cells: ev.cells });
        expect([...ev.results]).toEqual([...fresh.results]);
      }),
      { numRuns: 200 },
    );
  });
});
