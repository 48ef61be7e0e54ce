import { describe, expect, it } from 'vitest';
import { expressionCompletions, type CompletionSheet } from './expressionCompletion';

const sheet: CompletionSheet = {
  names: () => ['F', 'A', 'S', 'P'],
  kindOf: (name) => ({ F: 'quantity', A: 'quantity', S: 'stress', P: 'principal' })[name],
  valuesOf: (name) => (name === 'P' ? ['s1', 's2', 's3', 'vonMises'] : []),
};

describe('expressionCompletions', () => {
  it('offers cell names first, then units and functions, for the word being typed', () => {
    const found = expressionCompletions(sheet, 'F / ', true)!;
    expect(found.from).toBe(4);
    expect(found.options.slice(0, 4).map((o) => [o.label, o.detail])).toEqual([
      ['F', 'quantity'],
      ['A', 'quantity'],
      ['S', 'stress'],
      ['P', 'principal'],
    ]);
    expect(found.options.map((o) => o.label)).toEqual(expect.arrayContaining(['MPa', 'ksi', 'kip', 'deg', 'sqrt']));
    expect(found.options.find((o) => o.label === 'sqrt')?.apply).toBe('sqrt(');
  });

  it('starts the word where the name starts', () => {
    expect(expressionCompletions(sheet, '18 k', false)?.from).toBe(3);
  });

  it('offers the values of a cell after its name and a dot', () => {
    const found = expressionCompletions(sheet, '2 * P.vo', false)!;
    expect(found.from).toBe(6);
    expect(found.options.map((o) => o.label)).toEqual(['s1', 's2', 's3', 'vonMises']);
    expect(expressionCompletions(sheet, 'F.', false)).toBeNull();
  });

  it('stays quiet with no word, and inside a number exponent', () => {
    expect(expressionCompletions(sheet, 'F / ', false)).toBeNull();
    expect(expressionCompletions(sheet, '420e', false)).toBeNull();
  });

  it('does not offer a unit twice when a cell has its name', () => {
    const shadow = { ...sheet, names: () => ['m'] };
    expect(expressionCompletions(shadow, 'x', true)!.options.filter((o) => o.label === 'm')).toHaveLength(1);
  });
});
