/** An identifier in an expression, where it is, and how it is used. */
export interface IdentifierToken {
  name: string;
  from: number;
  to: number;
  /**
   * - `symbol`: a free name (a cell, a unit or a constant: the sheet decides which)
   * - `call`: a function name (followed by `(`)
   * - `property`: after a dot, a value of a cell (`P.s1`)
   */
  role: 'symbol' | 'call' | 'property';
}

/** Words of the expression language that are operators or literals, never names. */
export const OPERATOR_WORDS: ReadonlySet<string> = new Set([
  'and',
  'or',
  'not',
  'xor',
  'mod',
  'to',
  'in',
  'true',
  'false',
  'null',
  'undefined',
  'end',
]);

// Numbers first, so the `e` of `420e-6` is never read as a name; strings are skipped whole.
const TOKEN = /(\d+\.?\d*(?:[eE][+-]?\d+)?|\.\d+(?:[eE][+-]?\d+)?)|("(?:[^"\\]|\\.)*"?|'(?:[^'\\]|\\.)*'?)|([A-Za-z_][A-Za-z0-9_]*)/g;

/**
 * The identifiers of an expression with their positions, as the expression language reads them:
 * numbers (with exponents) and quoted strings are skipped; `in` and `to` are operators, except
 * that `in` after a number is the inch.
 * @example identifierTokens('F / A + P.s1 + sqrt(2)') // F, A, P: symbol; s1: property; sqrt: call
 */
export function identifierTokens(text: string): IdentifierToken[] {
  const tokens: IdentifierToken[] = [];
  // End of the last number, while nothing but spaces has followed it.
  let numberEnd = -1;
  for (const match of text.matchAll(TOKEN)) {
    const [whole, number, quoted, name] = match;
    const from = match.index;
    const to = from + whole.length;
    const afterNumber = numberEnd >= 0 && text.slice(numberEnd, from).trim() === '';
    numberEnd = number !== undefined ? to : -1;
    if (name === undefined || quoted !== undefined) continue;
    if (OPERATOR_WORDS.has(name) && !(name === 'in' && afterNumber)) continue;
    const before = text.slice(0, from).trimEnd();
    const after = text.slice(to).trimStart();
    const role = before.endsWith('.') && !/\d\.$/.test(before) ? 'property' : after.startsWith('(') ? 'call' : 'symbol';
    tokens.push({ name, from, to, role });
  }
  return tokens;
}
