import { createEvaluator } from '@sheaf/engine';
import { describe, expect, it } from 'vitest';
import { errorFieldOf } from './errorField';

describe('errorFieldOf', () => {
  it('reads the field from the engine error values of each kind of mistake', () => {
    const evaluator = createEvaluator({
      cells: [
        { id: 'a', kind: 'quantity', name: 'F', expr: '18 kN' },
        { id: 'b', kind: 'stress', name: 'S', sx: 'F', sy: '0 MPa', txy: '0 MPa' },
        { id: 'c', kind: 'criterion', name: 'C', of: 'Q', theory: 'von-mises', strength: { Sy: '250 MPa' } },
        { id: 'd', kind: 'criterion', name: 'D', of: 'F', theory: 'von-mises', strength: { Sy: '250 kN' } },
        { id: 'e', kind: 'rosette', name: 'G', layout: 'angles', angles: ['0 deg', 'x', '90 deg'], ea: '0', eb: '0', ec: '0', E: '200 GPa', nu: '0.3' },
        { id: 'f', kind: 'principal', name: 'P', of: 'S' },
        { id: 'g', kind: 'stress', name: 'S9', sx: '1 MPa', sy: '0 MPa', txy: '0 MPa' },
        { id: 'h', kind: 'criterion', name: 'G2', of: 'S9', theory: 'von-mises', strength: { Sy: '-5 MPa' } },
      ],
    });
    const field = (id: string) => errorFieldOf(evaluator.results.get(id));
    expect(field('a')).toBeNull();
    expect(field('b')).toBe('sx');
    expect(field('c')).toBe('of');
    expect(field('d')).toBe('of');
    expect(field('e')).toBe('angles[1]');
    // P depends on S, whose error is S's: nothing in P is marked.
    expect(field('f')).toBeNull();
    expect(field('h')).toBe('strength.Sy');
  });
});
