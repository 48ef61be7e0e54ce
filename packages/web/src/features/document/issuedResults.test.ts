import { describe, expect, it } from 'vitest';
import { issuedResults } from './issuedResults';
import { issuedRevision } from './revisionFixture';

// von Mises for a plane state, σ' = √(σx² − σxσy + σy² + 3τxy²) (common practice, no source).
const sx = 18e3 / (40e-3 * 12e-3); // P / A, Pa
const txy = 22e6;
const vonMises = Math.sqrt(sx ** 2 + 3 * txy ** 2);

describe('issuedResults', () => {
  it('shows the stored results, which a fresh evaluation with the frozen materials reproduces', () => {
    const revision = issuedRevision();
    const issued = issuedResults(revision);
    expect(issued.mismatches).toEqual([]);
    const de = issued.results.get('c1');
    expect(de?.ok && de.values.factor).toBeCloseTo(250e6 / vonMises, 10);
    // The material check used the frozen 355 MPa, not a library value of today.
    const mat = issued.results.get('c2');
    expect(mat?.ok && mat.values.factor).toBeCloseTo(355e6 / vonMises, 10);
    // Figures and units come from the evaluation beside the stored numbers.
    expect(de?.ok && de.criterion?.theory).toBe('von-mises');
    expect(issued.evaluator.equation('c1', 'SI')).toMatch(/\\frac\{250\}/);
  });

  it('names every value that does not reproduce, and still shows the issued one', () => {
    const revision = issuedRevision();
    const cells = { ...revision.results.cells, DE: { ...revision.results.cells.DE!, values: { ...revision.results.cells.DE!.values, factor: 9.99 } } };
    const issued = issuedResults({ ...revision, results: { cells } });
    expect(issued.mismatches).toEqual([{ cellId: 'c1', cellName: 'DE', key: 'factor', issued: '9.99', now: String(250e6 / vonMises) }]);
    const de = issued.results.get('c1');
    expect(de?.ok && de.values.factor).toBe(9.99);
  });

  it('tells an issued error from a result that no longer evaluates, and a missing material', () => {
    const revision = issuedRevision();
    // Without its frozen material the check cannot evaluate now: that is not what was issued.
    const withoutMaterial = issuedResults({ ...revision, materials: {} });
    expect(withoutMaterial.mismatches).toEqual([
      expect.objectContaining({ cellId: 'c2', key: null, issued: 'values', now: expect.stringMatching(/^unknown-material: /) }),
    ]);
    // A cell issued with an error shows that error.
    const cells = { ...revision.results.cells, DE: { kind: 'criterion' as const, error: { code: 'domain', message: 'strength.Sy must be positive' } } };
    const issued = issuedResults({ ...revision, results: { cells } });
    const de = issued.results.get('c1');
    expect(de?.ok).toBe(false);
    expect(!de?.ok && de?.error).toMatchObject({ code: 'domain', message: 'strength.Sy must be positive' });
    expect(issued.mismatches.map((m) => [m.cellName, m.key, m.issued])).toEqual([['DE', null, 'domain: strength.Sy must be positive']]);
  });

  it('compares lists and unbounded factors value by value', () => {
    const revision = issuedRevision();
    const fe = revision.results.cells.FE!;
    const cells = { ...revision.results.cells, FE: { ...fe, values: { ...fe.values, minFactor: null, extra: [1, null] } } };
    const issued = issuedResults({ ...revision, results: { cells } });
    expect(issued.mismatches.map((m) => [m.key, m.issued])).toEqual([
      ['minFactor', 'unbounded'],
      ['extra', '[1, null]'],
    ]);
  });
});
