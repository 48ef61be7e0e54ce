import { createEvaluator, type CellOk } from '@sheaf/engine';
import { describe, expect, it } from 'vitest';
import { resultRows } from './resultRows';
import { verdictOf } from './verdict';

// The lifting-lug sheet of docs/sheet-format.md: σx = 18 kN / 480 mm² = 37.5 MPa exactly.
const evaluator = createEvaluator({
  cells: [
    { id: 'q', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 's', kind: 'stress', name: 'S', sx: 'F / (40 mm * 12 mm)', sy: '0 MPa', txy: '22 MPa' },
    { id: 's3', kind: 'stress', name: 'S3', sx: '80 MPa', sy: '-20 MPa', txy: '15 MPa', sz: '5 MPa', tyz: '0 MPa', tzx: '-7 MPa' },
    { id: 'r', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
    { id: 'p', kind: 'principal', name: 'P', of: 'S' },
    { id: 'c', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    { id: 'low', kind: 'criterion', name: 'CL', of: 'S', theory: 'von-mises', strength: { Sy: '60 MPa' }, required: '1.5' },
    { id: 'fail', kind: 'criterion', name: 'CF', of: 'S', theory: 'von-mises', strength: { Sy: '50 MPa' } },
    { id: 'hyd', kind: 'stress', name: 'H', sx: '-10 MPa', sy: '-10 MPa', txy: '0 MPa', sz: '-10 MPa', tyz: '0 MPa', tzx: '0 MPa' },
    { id: 'ch', kind: 'criterion', name: 'CH', of: 'H', theory: 'von-mises', strength: { Sy: '250 MPa' } },
  ],
});
const ok = (id: string) => evaluator.results.get(id) as CellOk;
const brief = (rows: { key: string; number: string; unit: string }[]) => rows.map((r) => `${r.key}=${r.number} ${r.unit}`.trim());

describe('resultRows', () => {
  it('shows a quantity under its own name, converted to the unit system', () => {
    expect(resultRows(ok('q'), 'SI', 'F').primary).toEqual([
      { key: 'value', symbol: 'F', meaning: 'value of F', number: '18', unit: 'kN' },
    ]);
    // 18 kN / 4.4482216152605 N per lbf = 4046.6 lbf = 4.0466 kip.
    expect(brief(resultRows(ok('q'), 'US', 'F').primary)).toEqual(['value=4.0466 kip']);
  });

  it('shows a plane stress without its zero out-of-plane components, a 3D one with them', () => {
    expect(brief(resultRows(ok('s'), 'SI', 'S').primary)).toEqual(['sx=37.5 MPa', 'sy=0 MPa', 'txy=22 MPa']);
    expect(resultRows(ok('s3'), 'SI', 'S3').primary.map((r) => r.key)).toEqual(['sx', 'sy', 'txy', 'sz', 'tyz', 'tzx']);
  });

  it('leads a rotate cell with its angle and primes the rotated components', () => {
    const rows = resultRows(ok('r'), 'SI', 'R').primary;
    expect(rows.map((r) => `${r.symbol}${r.sub ?? ''}`)).toEqual(['θ', 'σx′', 'σy′', 'τx′y′']);
    expect(rows[0]).toMatchObject({ number: '30', unit: '°' });
  });

  it('orders principal values in-plane first, and lists the rest under more', () => {
    const { primary, more } = resultRows(ok('p'), 'SI', 'P');
    expect(brief(primary)).toEqual([
      'p1=47.656 MPa',
      'p2=-10.156 MPa',
      'thetaP=24.78 °',
      'tauMaxInPlane=28.906 MPa',
      's1=47.656 MPa',
      's2=0 MPa',
      's3=-10.156 MPa',
      'tauMax=28.906 MPa',
      'vonMises=53.463 MPa',
    ]);
    expect(more.map((r) => r.key)).toEqual(expect.arrayContaining(['tresca', 'I1', 'I2', 'I3', 'n1']));
    expect(more.find((r) => r.key === 'I2')).toMatchObject({ unit: 'MPa²' });
  });

  it('shows a criterion as equivalent stress, factor, required factor and margin', () => {
    // 53.463 MPa / 6.894757 MPa per ksi = 7.7541 ksi.
    expect(brief(resultRows(ok('c'), 'US', 'C').primary)).toEqual([
      'equivalent=7.7541 ksi',
      'factor=4.6762',
      'required=1.5',
      'margin=2.1174',
    ]);
  });

  it('words an unbounded factor instead of printing a huge number', () => {
    expect(resultRows(ok('ch'), 'SI', 'CH').primary.find((r) => r.key === 'factor')).toMatchObject({ number: 'unbounded', unit: '' });
  });
});

describe('verdictOf', () => {
  it('passes at or above the required factor, warns between 1 and it, fails below 1', () => {
    expect(verdictOf(ok('c'))).toBe('pass');
    expect(verdictOf(ok('low'))).toBe('low');
    expect(verdictOf(ok('fail'))).toBe('fail');
    expect(verdictOf(ok('ch'))).toBe('pass');
    expect(verdictOf(ok('s'))).toBeNull();
  });
});
