import { describe, expect, it } from 'vitest';
import { checkDimension } from './checkDimension';
import { DIMENSIONS, describeDimension } from './dimension';
import { compileExpression, evaluateExpression, isExpressionProblem, scopeValueOf, type Quantity } from './expression';
import { formatNumber, formatQuantity } from './formatQuantity';
import { BLOCKED_FUNCTIONS } from './math';

const value = (text: string, scope: ReadonlyMap<string, unknown> = new Map()): Quantity => {
  const q = evaluateExpression(text, scope);
  if (isExpressionProblem(q)) throw new Error(q.message);
  return q;
};

describe('restricted expressions (TECH-NOTES, mathjs safely)', () => {
  for (const name of BLOCKED_FUNCTIONS) {
    it(`${name}(...) cannot be called from an expression`, () => {
      const r = evaluateExpression(`${name}("1 + 1")`, new Map());
      expect(isExpressionProblem(r) && r.code).toBe('forbidden');
    });
  }

  it('assignments, blocks, unknown functions and property tricks are refused', () => {
    const code = (t: string) => {
      const r = evaluateExpression(t, new Map([['S', { sx: 1 }]]));
      return isExpressionProblem(r) ? r.code : 'value';
    };
    expect(code('a = 5')).toBe('parse');
    expect(code('f(x) = x^2')).toBe('parse');
    expect(code('1; 2')).toBe('parse');
    expect(code('frobnicate(2)')).toBe('unknown-name');
    expect(code('S.constructor')).toBe('evaluation');
    expect(code('2 +')).toBe('parse');
    expect(code('   ')).toBe('parse');
  });

  it('results must be finite real scalars', () => {
    const code = (t: string) => {
      const r = evaluateExpression(t, new Map());
      return isExpressionProblem(r) ? r.code : 'value';
    };
    expect(code('sqrt(-4)')).toBe('domain');
    expect(code('1 / 0')).toBe('domain');
    expect(code('[1, 2]')).toBe('invalid-field');
    expect(code('1 > 2')).toBe('invalid-field');
    expect(code('MPa')).toBe('invalid-field');
    expect(code('2 MPa + 3 m')).toBe('unit-mismatch');
  });
});

describe('units of the trade', () => {
  it('ksi = 1000 psi and kip = 1000 lbf (ASTM/NIST definitions: 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m)', () => {
    const psi = 4.4482216152605 / 0.0254 ** 2;
    expect(value('1 ksi').si / (1000 * psi)).toBeCloseTo(1, 9);
    expect(value('1 kpsi').si).toBe(value('1 ksi').si);
    expect(value('1 kip').si).toBeCloseTo(4448.2216152605, 9);
    expect(value('1 psi').si).toBeCloseTo(psi, 9);
    expect(value('1 Msi').si / (1e6 * psi)).toBeCloseTo(1, 9);
  });

  it('converts to SI base numbers: 18 kN over 40 mm x 12 mm is 37.5 MPa (common practice, no source)', () => {
    const q = value('18 kN / (40 mm * 12 mm)');
    expect(q.si).toBeCloseTo(37.5e6, 6);
    expect(q.dim).toEqual(DIMENSIONS.pressure);
    expect(value('30 deg').si).toBeCloseTo(Math.PI / 6, 15);
    expect(value('5 mm / (2 mm)')).toEqual({ si: 2.5, dim: DIMENSIONS.dimensionless });
  });

  it('names in the scope shadow units: a cell A is not the ampere', () => {
    const scope = new Map<string, unknown>([['A', scopeValueOf({ si: 480e-6, dim: DIMENSIONS.area })], ['F', scopeValueOf({ si: 18e3, dim: DIMENSIONS.force })]]);
    expect(value('F / A', scope).si).toBeCloseTo(37.5e6, 6);
    expect(value('F / A', scope).dim).toEqual(DIMENSIONS.pressure);
    expect(scopeValueOf({ si: 0.3, dim: DIMENSIONS.dimensionless })).toBe(0.3);
  });

  it('compiles each expression once', () => {
    const a = compileExpression('F / A + 2 MPa');
    expect(compileExpression('F / A + 2 MPa')).toBe(a);
    expect(a.symbols).toEqual(['F', 'A', 'MPa']);
  });
});

describe('dimension checks name the field and what it got', () => {
  it('messages', () => {
    expect(checkDimension('sx', DIMENSIONS.force, 'pressure')).toBe('sx: expected a stress (a pressure, e.g. 120 MPa or 18 ksi), got a force');
    expect(checkDimension('angle', DIMENSIONS.dimensionless, 'angle')).toMatch(/^angle: expected an angle .* got a plain number \(write the unit/);
    expect(checkDimension('nu', DIMENSIONS.pressure, 'dimensionless')).toBe('nu: expected a plain number, got a pressure (stress)');
    expect(checkDimension('E', DIMENSIONS.pressure, 'pressure')).toBeNull();
    expect(checkDimension('x', DIMENSIONS.length, 'any')).toBeNull();
    expect(describeDimension([0, -2, 0, 0, 0, 0, 0, 0, 0])).toBe('units of m^-2');
  });
});

describe('formatting', () => {
  it('numbers to significant digits', () => {
    expect(formatNumber(47.6560984)).toBe('47.656');
    expect(formatNumber(2)).toBe('2');
    expect(formatNumber(0.00054)).toBe('0.00054');
    expect(formatNumber(1.5e-6)).toBe('1.5e-6');
    expect(formatNumber(-123456789)).toBe('-1.2346e+8');
    expect(formatNumber(Infinity)).toBe('∞');
  });

  it('SI and US display units', () => {
    expect(formatQuantity(47.656098e6, 'stress', 'SI').text).toBe('47.656 MPa');
    expect(formatQuantity(6894757.29, 'stress', 'US').text).toBe('1 ksi');
    expect(formatQuantity(4448.2216, [1, 1, -2, 0, 0, 0, 0, 0, 0], 'US').text).toBe('1 kip');
    expect(formatQuantity(0.0254, DIMENSIONS.length, 'US').text).toBe('1 in');
    expect(formatQuantity(Math.PI / 6, 'angle', 'SI').text).toBe('30°');
    expect(formatQuantity(540e-6, 'strain', 'US').text).toBe('540 µε');
    expect(formatQuantity(2.186, 'ratio', 'SI').text).toBe('2.186');
    expect(formatQuantity(3, [0, -2, 0, 0, 0, 0, 0, 0, 0], 'SI').text).toBe('3 m^-2');
    expect(formatQuantity(47.656e6, 'stress', 'SI').latex).toBe('47.656\\,\\mathrm{MPa}');
  });
});
