import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createEvaluator } from '../sheet/createEvaluator';
import { machineOutput } from '../sheet/machineOutput';
import { diffRevisions } from './diffRevisions';
import type { RevisionSnapshot } from './types';

type Cells = RevisionSnapshot['content']['cells'];

/** A revision as the server issues it: the content and the engine's machine output of it. */
function issue(number: number, content: RevisionSnapshot['content']): RevisionSnapshot {
  const evaluator = createEvaluator({ cells: content.cells });
  return { number, content, results: machineOutput(content.cells, evaluator.results) };
}

const lug = JSON.parse(
  readFileSync(new URL('../../../../examples/lifting-lug-weld-toe.sheaf.json', import.meta.url), 'utf8'),
) as RevisionSnapshot['content'];

/**
 * Revision 2 of the lug: the shear force now acts 50 mm above the weld toe instead of 35 mm, the
 * rotated-axes cell is dropped and a note on the new lever arm is added after it.
 */
function lugRevision2(): RevisionSnapshot['content'] {
  const cells: Cells = lug.cells
    .filter((cell) => cell.id !== 'r1')
    .map((cell) => (cell.id === 'q5' ? { ...cell, expr: '50 mm' } : cell));
  const at = cells.findIndex((cell) => cell.id === 'q5') + 1;
  const note = { id: 'n2', kind: 'note', text: 'Lever arm measured on the as-built lug: 50 mm.' };
  return { ...lug, cells: [...cells.slice(0, at), note, ...cells.slice(at)] };
}

describe('diffRevisions on the lifting lug example', () => {
  const rev1 = issue(1, lug);
  const rev2 = issue(2, lugRevision2());
  const diff = diffRevisions(rev1, rev2);

  it('lists exactly the cells added, removed and changed, with each changed input', () => {
    expect(diff.from).toBe(1);
    expect(diff.to).toBe(2);
    expect(diff.sheet).toEqual([]);
    expect(diff.added).toEqual([{ id: 'n2', kind: 'note', name: null, index: 6 }]);
    expect(diff.removed).toEqual([{ id: 'r1', kind: 'rotate', name: 'Stoe', index: 12 }]);
    expect(diff.changed).toEqual([
      { id: 'q5', kind: 'quantity', name: 'e', index: 5, oldIndex: 5, inputs: [{ field: 'expr', old: '35 mm', new: '50 mm' }], moved: false },
    ]);
  });

  it('lists the results that moved: only the cells downstream of the lever arm', () => {
    const moved = [...new Set(diff.results.map((change) => change.cellName))];
    // M = Fsh e; S takes M; principal and both criteria take S. A, Z, Fax, Fsh do not depend on e.
    expect(moved).toEqual(['e', 'M', 'S', 'Pr', 'vonMises', 'tresca']);
    expect(diff.results.filter((c) => c.cellName === 'S').map((c) => c.key)).toEqual(['sx']);
    expect(diff.results.find((c) => c.cellName === 'e')).toMatchObject({
      key: 'value',
      old: { text: '35 mm', unit: 'mm' },
      new: { text: '50 mm', unit: 'mm' },
      crossing: null,
    });
  });

  it('gives old and new values with units, worked by hand', () => {
    // Section A-A by hand (common practice, no source): Fax = P cos 30° = 15.588 kN, Fsh = 9 kN,
    // A = 480 mm², Z = t b²/6 = 3200 mm³; sx = Fax/A + Fsh e / Z, txy = Fsh/A = 18.75 MPa.
    // e = 35 mm: sx = 32.476 + 98.438 = 130.91 MPa; e = 50 mm: sx = 32.476 + 140.63 = 173.10 MPa.
    const sx = diff.results.find((c) => c.cellName === 'S' && c.key === 'sx');
    expect(sx?.old?.si).toBeCloseTo(130.913e6, -3); // within 1 kPa
    expect(sx?.new?.si).toBeCloseTo(173.101e6, -3);
    expect(sx?.new?.unit).toBe('MPa');
    expect(sx?.old?.text).toBe('130.91 MPa');
    expect(sx?.new?.text).toBe('173.1 MPa');
    // von Mises in plane stress, sqrt(sx² + 3 txy²) (distortion energy, from memory):
    // 134.88 MPa and 176.12 MPa; factor Sy / sigma' with Sy = 250 MPa: 1.8535 and 1.4195.
    const factor = diff.results.find((c) => c.cellName === 'vonMises' && c.key === 'factor');
    expect(factor?.old?.si).toBeCloseTo(1.8535, 3);
    expect(factor?.new?.si).toBeCloseTo(1.4195, 3);
    expect([factor?.old?.text, factor?.new?.text]).toEqual(['1.8535', '1.4195']);
    const equivalent = diff.results.find((c) => c.cellName === 'vonMises' && c.key === 'equivalent');
    expect(equivalent?.new?.text).toBe('176.12 MPa');
  });

  it('highlights the verdicts that crossed from pass to fail against the required 1.5', () => {
    // Tresca by hand: tau_max = sqrt((sx/2)² + txy²); factor Sy / (2 tau_max) = 1.8358 -> 1.4115.
    expect(diff.crossings).toEqual([
      { cellId: 'c1', cellName: 'vonMises', kind: 'criterion', from: 'pass', to: 'fail', direction: 'pass-to-fail' },
      { cellId: 'c2', cellName: 'tresca', kind: 'criterion', from: 'pass', to: 'fail', direction: 'pass-to-fail' },
    ]);
    const passRows = diff.results.filter((c) => c.key === 'pass');
    expect(passRows.map((c) => [c.cellName, c.old?.text, c.new?.text, c.crossing])).toEqual([
      ['vonMises', 'pass', 'fail', 'pass-to-fail'],
      ['tresca', 'pass', 'fail', 'pass-to-fail'],
    ]);
    const tresca = diff.results.find((c) => c.cellName === 'tresca' && c.key === 'factor');
    expect(tresca?.old?.si).toBeCloseTo(1.8358, 3);
    expect(tresca?.new?.si).toBeCloseTo(1.4115, 3);
  });

  it('describes the change backwards when the revisions are swapped', () => {
    const back = diffRevisions(rev2, rev1);
    expect(back.added.map((c) => c.id)).toEqual(['r1']);
    expect(back.removed.map((c) => c.id)).toEqual(['n2']);
    expect(back.crossings.map((c) => c.direction)).toEqual(['fail-to-pass', 'fail-to-pass']);
  });

  it('finds nothing between a revision and itself', () => {
    expect(diffRevisions(rev1, issue(2, lug))).toEqual({ from: 1, to: 2, sheet: [], added: [], removed: [], changed: [], results: [], crossings: [] });
  });
});

describe('diffRevisions on small sheets', () => {
  it('reports a cell moved against its neighbours, not the cells an insertion shifted', () => {
    const a = issue(1, { cells: [
      { id: 'a', kind: 'quantity', name: 'A', expr: '1 mm' },
      { id: 'b', kind: 'quantity', name: 'B', expr: '2 mm' },
      { id: 'c', kind: 'quantity', name: 'C', expr: '3 mm' },
    ] });
    const b = issue(2, { cells: [
      { id: 'x', kind: 'note', text: 'new first cell' },
      { id: 'c', kind: 'quantity', name: 'C', expr: '3 mm' },
      { id: 'a', kind: 'quantity', name: 'A', expr: '1 mm' },
      { id: 'b', kind: 'quantity', name: 'B', expr: '2 mm' },
    ] });
    const diff = diffRevisions(a, b);
    expect(diff.changed).toEqual([{ id: 'c', kind: 'quantity', name: 'C', index: 1, oldIndex: 2, inputs: [], moved: true }]);
    expect(diff.results).toEqual([]);
  });

  it('compares object fields member by member, renames and title changes', () => {
    const a = issue(1, { title: 'Hub', unitSystem: 'SI', cells: [
      { id: 's', kind: 'stress', name: 'S', sx: '100 MPa', sy: '0 MPa', txy: '0 MPa' },
      { id: 'k', kind: 'criterion', name: 'K', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '2' },
    ] });
    const b = issue(2, { title: 'Pulley hub', unitSystem: 'US', cells: [
      { id: 's', kind: 'stress', name: 'S', sx: '100 MPa', sy: '0 MPa', txy: '0 MPa' },
      { id: 'k', kind: 'criterion', name: 'K2', of: 'S', theory: 'von-mises', strength: { Sy: '200 MPa' }, required: '2' },
    ] });
    const diff = diffRevisions(a, b);
    expect(diff.sheet).toEqual([
      { field: 'title', old: 'Hub', new: 'Pulley hub' },
      { field: 'unitSystem', old: 'SI', new: 'US' },
    ]);
    expect(diff.changed[0]?.inputs).toEqual([
      { field: 'name', old: 'K', new: 'K2' },
      { field: 'strength.Sy', old: '250 MPa', new: '200 MPa' },
    ]);
    // 250/100 = 2.5 passes 2; 200/100 = 2 still passes (factor >= required). Written in ksi (US).
    const factor = diff.results.find((c) => c.key === 'factor');
    expect([factor?.old?.text, factor?.new?.text]).toEqual(['2.5', '2']);
    expect(diff.crossings).toEqual([]);
    expect(diff.results.find((c) => c.key === 'margin')?.new?.text).toBe('0');
  });

  it('reports a cell that went from a value to an error as one change of the whole result', () => {
    const a = issue(1, { cells: [{ id: 'q', kind: 'quantity', name: 'L', expr: '2 m' }] });
    const b = issue(2, { cells: [{ id: 'q', kind: 'quantity', name: 'L', expr: '2 m + 3 kN' }] });
    const [change, ...rest] = diffRevisions(a, b).results;
    expect(rest).toEqual([]);
    expect(change).toMatchObject({ cellId: 'q', key: null, old: { text: 'evaluated' }, crossing: null });
    expect(change?.new?.text).toMatch(/^error \(unit-mismatch\)/);
  });

  it('keeps a repeated name apart by cell id, as the machine output does', () => {
    const cells = (second: string): Cells => [
      { id: 'a', kind: 'quantity', name: 'F', expr: '1 kN' },
      { id: 'b', kind: 'quantity', name: 'F', expr: second },
    ];
    const diff = diffRevisions(issue(1, { cells: cells('2 kN') }), issue(2, { cells: cells('5 kN') }));
    expect(diff.changed.map((c) => c.id)).toEqual(['b']);
    // Both carry a duplicate-name error, so their results do not move; the input change is listed.
    expect(diff.results).toEqual([]);
  });
});
