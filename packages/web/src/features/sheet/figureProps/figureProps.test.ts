import { createEvaluator } from '@sheaf/engine';
import { describe, expect, it } from 'vitest';
import { stressDisplayUnit } from './displayUnit';
import { envelopeFigureOf } from './envelopeFigure';
import { angleText, mohrFigureOf } from './mohrFigure';

const evaluator = createEvaluator({
  cells: [
    { id: 's', kind: 'stress', name: 'S', sx: '37.5 MPa', sy: '0 MPa', txy: '22 MPa' },
    { id: 'r', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
    { id: 'p', kind: 'principal', name: 'P', of: 'S' },
    { id: 's3', kind: 'stress', name: 'S3', sx: '-70 kPa', sy: '-150 kPa', txy: '18 kPa', sz: '-80 kPa', tyz: '0 kPa', tzx: '0 kPa' },
    { id: 'c', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    { id: 'c3', kind: 'criterion', name: 'C3', of: 'S3', theory: 'mohr-coulomb', strength: { c: '12 kPa', phi: '30 deg' } },
    { id: 'bad', kind: 'stress', name: 'B', sx: 'nope', sy: '0 MPa', txy: '0 MPa' },
  ],
});
const result = (id: string) => evaluator.results.get(id);

describe('mohrFigureOf', () => {
  it('draws a plane state as its circle through the face points, in Pa', () => {
    expect(mohrFigureOf(result('s'))).toMatchObject({ kind: 'plane', sx: 37.5e6, sy: 0, txy: 22e6 });
  });

  it('draws a rotate cell on the circle of the state it turns, with the rotated pair', () => {
    const figure = mohrFigureOf(result('r'));
    expect(figure).toMatchObject({ kind: 'plane', sx: 37.5e6, sy: 0, txy: 22e6 });
    if (figure?.kind !== 'plane' || !figure.rotated) throw new Error('expected a rotated plane figure');
    expect(figure.rotated.angleRad).toBeCloseTo(Math.PI / 6, 12);
    // σx′ = 18.75 + 18.75 cos 60° + 22 sin 60° = 47.178 MPa (stress transformation, common practice, no source).
    expect(figure.rotated.sxr / 1e6).toBeCloseTo(47.178, 3);
    expect(figure.rotated.sxr + figure.rotated.syr).toBeCloseTo(37.5e6, 3);
  });

  it('draws a state with σz as its three circles, principal stresses sorted', () => {
    const figure = mohrFigureOf(result('s3'));
    expect(figure?.kind).toBe('three');
    if (figure?.kind !== 'three') return;
    expect(figure.s1).toBeGreaterThanOrEqual(figure.s2);
    expect(figure.s2).toBeGreaterThanOrEqual(figure.s3);
    expect(figure.s2).toBe(-80e3);
  });

  it('draws nothing for a failed cell', () => {
    expect(mohrFigureOf(result('bad'))).toBeNull();
  });
});

describe('angleText', () => {
  it('writes a dragged angle in degrees to the half degree', () => {
    expect(angleText((32.4 * Math.PI) / 180)).toBe('32.5 deg');
    expect(angleText((-0.1 * Math.PI) / 180)).toBe('0 deg');
    expect(angleText(-Math.PI / 4)).toBe('-45 deg');
  });
});

describe('envelopeFigureOf', () => {
  it('gives the theory outline, the point (p1, p2) and the load line factor of a plane criterion', () => {
    const figure = envelopeFigureOf(result('c'), 'SI', false)!;
    expect(figure.envelopes).toHaveLength(1);
    expect(figure.envelopes[0]!.label).toBe('von Mises (distortion energy), Sy = 250 MPa');
    expect(figure.point.sA / 1e6).toBeCloseTo(47.656, 3);
    expect(figure.point.sB / 1e6).toBeCloseTo(-10.156, 3);
    expect(figure.factor).toBeCloseTo(4.676, 3);
    expect(figure.required).toBe(1.5);
  });

  it('overlays the other theories that the same strengths allow when comparing', () => {
    const figure = envelopeFigureOf(result('c'), 'US', true)!;
    const theories = new Set(figure.envelopes.map((e) => e.theory));
    // Sy alone is what von Mises and Tresca need; the brittle theories need Sut and Suc.
    expect(theories).toEqual(new Set(['von-mises', 'tresca']));
    expect(figure.envelopes[0]!.label).toBe('von Mises (distortion energy), Sy = 36.26 ksi');
  });

  it('has no σ1–σ2 figure for a state with out-of-plane stress', () => {
    expect(envelopeFigureOf(result('c3'), 'SI', false)).toBeNull();
  });
});

describe('stressDisplayUnit', () => {
  it('prints MPa or ksi', () => {
    expect(stressDisplayUnit('SI')).toEqual({ label: 'MPa', perPa: 1e-6 });
    expect(stressDisplayUnit('US').label).toBe('ksi');
    expect(1e6 * stressDisplayUnit('US').perPa).toBeCloseTo(0.145038, 6);
  });
});
