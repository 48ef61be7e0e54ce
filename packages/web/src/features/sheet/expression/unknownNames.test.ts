import { compileExpression } from '@sheaf/engine';
import { describe, expect, it } from 'vitest';
import { identifierTokens } from './expressionTokens';
import { cellReferences, unknownNames } from './unknownNames';

const names = new Set(['F', 'A', 'P', 'd', 'M']);

describe('identifierTokens', () => {
  it('reads symbols, calls and values after a dot, skipping numbers with exponents', () => {
    expect(identifierTokens('32 * M / (pi * d^3) + P.s1 + sqrt(2e-3) + 420e-6').map((t) => [t.name, t.role])).toEqual([
      ['M', 'symbol'],
      ['pi', 'symbol'],
      ['d', 'symbol'],
      ['P', 'symbol'],
      ['s1', 'property'],
      ['sqrt', 'call'],
    ]);
  });

  it('reads `in` as the inch after a number and as an operator elsewhere', () => {
    expect(identifierTokens('3 in to mm').map((t) => t.name)).toEqual(['in', 'mm']);
    expect(identifierTokens('x in mm').map((t) => t.name)).toEqual(['x', 'mm']);
  });

  it('finds the same free symbols as the engine for expressions of the demo sheets', () => {
    for (const text of ['F / A', '32 * M / (pi * d^3)', 'p * r / (2 * t)', '40 mm * 12 mm', '16 * T / (pi * d^3) + P.s1']) {
      const ours = identifierTokens(text).filter((t) => t.role === 'symbol').map((t) => t.name);
      expect(new Set(ours)).toEqual(new Set(compileExpression(text).symbols));
    }
  });
});

describe('unknownNames', () => {
  it('marks names no cell has that are not units or constants, with their positions', () => {
    expect(unknownNames('F / A_weld + Fy', names)).toEqual([
      { name: 'A_weld', from: 4, to: 10 },
      { name: 'Fy', from: 13, to: 15 },
    ]);
  });

  it('accepts units, prefixes, allowed constants, cell values after a dot and functions', () => {
    expect(unknownNames('18 kN / (40 mm * 12 mm) + 2 ksi + pi * e + P.vonMises + sqrt(4) * 1 MPa', names)).toEqual([]);
  });

  it('flags constants the sheet does not allow, which almost surely mean a missing cell', () => {
    expect(unknownNames('phi * tau', names).map((r) => r.name)).toEqual(['phi', 'tau']);
  });

  it('lets a cell shadow a unit of the same name', () => {
    expect(cellReferences('F / A', names).map((r) => r.name)).toEqual(['F', 'A']);
    expect(unknownNames('F / A', new Set())).toEqual([]);
  });
});
