import type { EvalFunction, MathNode } from 'mathjs';
import { DIMENSIONS, baseUnitOf, type Dimension } from './dimension';
import { ALLOWED_CONSTANTS, BLOCKED_FUNCTIONS, compileNode, isCallableFunction, isUnit, isUnitName, parseExpression, unitFromSI } from './math';

/** A quantity as the engine keeps it: a number in SI base units and its dimension. @public */
export interface Quantity {
  readonly si: number;
  readonly dim: Dimension;
}

/** Why an expression has no value. @public */
export interface ExpressionProblem {
  readonly code: 'parse' | 'unknown-name' | 'forbidden' | 'unit-mismatch' | 'domain' | 'evaluation' | 'invalid-field';
  readonly message: string;
}

/** A parsed and compiled expression, cached by its text. @public */
export interface CompiledExpression {
  readonly text: string;
  /** Free symbols (not called as functions): cell names, units or constants — the sheet decides. */
  readonly symbols: readonly string[];
  readonly node: MathNode | null;
  readonly problem: ExpressionProblem | null;
  readonly code: EvalFunction | null;
}

const cache = new Map<string, CompiledExpression>();
const constants = new Map<string, Quantity | ExpressionProblem>();
const CACHE_LIMIT = 20000;

/**
 * Run a mathjs call and turn what it throws into a problem. This is the only place in the engine
 * that catches what mathjs throws (STYLE: errors are values).
 */
function tryMath<T>(run: () => T, code: ExpressionProblem['code']): T | ExpressionProblem {
  try {
    return run();
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    if (/not available in sheet expressions/.test(message)) return { code: 'forbidden', message };
    if (/Units do not match|unit.*(do not|does not) match|Unit .* not found|dimension/i.test(message)) {
      return { code: 'unit-mismatch', message };
    }
    if (/Undefined symbol|Undefined function/.test(message)) return { code: 'unknown-name', message };
    return { code, message };
  }
}

function isProblem(value: unknown): value is ExpressionProblem {
  return typeof value === 'object' && value !== null && 'code' in value && 'message' in value && !isUnit(value);
}

/** Structural checks: no assignments, blocks or calls of unknown or blocked functions. */
function inspect(node: MathNode): { symbols: string[]; problem: ExpressionProblem | null } {
  const symbols = new Set<string>();
  const calledSymbols = new Set<MathNode>();
  let problem: ExpressionProblem | null = null;
  node.traverse((n) => {
    if (problem) return;
    switch (n.type) {
      case 'AssignmentNode':
      case 'FunctionAssignmentNode':
        problem = { code: 'parse', message: 'assignments are not allowed here; define a quantity cell instead' };
        return;
      case 'BlockNode':
        problem = { code: 'parse', message: 'one expression only (no ; or line breaks)' };
        return;
      case 'FunctionNode': {
        const fn = (n as unknown as { fn: MathNode & { name?: string } }).fn;
        if (fn.type !== 'SymbolNode' || !fn.name) {
          problem = { code: 'parse', message: 'only named functions can be called' };
          return;
        }
        calledSymbols.add(fn);
        if (!isCallableFunction(fn.name)) {
          problem = (BLOCKED_FUNCTIONS as readonly string[]).includes(fn.name)
            ? { code: 'forbidden', message: `${fn.name} is not available in sheet expressions` }
            : { code: 'unknown-name', message: `unknown function ${fn.name}` };
        }
        return;
      }
      case 'SymbolNode':
        if (!calledSymbols.has(n)) symbols.add((n as unknown as { name: string }).name);
        return;
      default:
        return;
    }
  });
  return { symbols: [...symbols], problem };
}

/**
 * Parse and compile an expression once; later calls with the same text return the cached result.
 * A parse error or a forbidden construct is kept as `problem`.
 * @example compileExpression('F / A').symbols // ['F', 'A']
 * @public
 */
export function compileExpression(text: string): CompiledExpression {
  const hit = cache.get(text);
  if (hit) return hit;
  let compiled: CompiledExpression;
  const node: MathNode | ExpressionProblem =
    text.trim() === '' ? { code: 'parse', message: 'is empty' } : tryMath(() => parseExpression(text), 'parse');
  if (isProblem(node)) {
    compiled = { text, symbols: [], node: null, problem: node, code: null };
  } else {
    const { symbols, problem } = inspect(node);
    const code = problem ? null : tryMath(() => compileNode(node), 'parse');
    compiled = isProblem(code)
      ? { text, symbols, node, problem: code, code: null }
      : { text, symbols, node, problem, code };
  }
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(text, compiled);
  return compiled;
}

/**
 * True when a symbol of an expression stands on its own without a cell of that name: a unit
 * mathjs knows (with or without prefix) or an allowed constant (`pi`, `e`, `Infinity`). Editors
 * use it to mark the other symbols as unknown names, as the sheet's graph does.
 * @example isFreeStandingSymbol('MPa') // true; isFreeStandingSymbol('phi') // false
 * @public
 */
export function isFreeStandingSymbol(name: string): boolean {
  // Cached: units do not change while the engine runs, and the lookup in mathjs is slow.
  let known = freeStanding.get(name);
  if (known === undefined) {
    known = isUnitName(name) || ALLOWED_CONSTANTS.has(name);
    if (freeStanding.size < CACHE_LIMIT) freeStanding.set(name, known);
  }
  return known;
}

const freeStanding = new Map<string, boolean>();

/** Convert what mathjs returned into a quantity, or say why it is not one. */
function toQuantity(value: unknown): Quantity | ExpressionProblem {
  if (typeof value === 'number') {
    return Number.isFinite(value) ? { si: value, dim: DIMENSIONS.dimensionless } : { code: 'domain', message: `is not a finite number (${value})` };
  }
  if (isUnit(value)) {
    const v = (value as unknown as { value: unknown }).value;
    if (v === null || v === undefined) return { code: 'invalid-field', message: 'is a unit without a number (write e.g. 250 MPa)' };
    if (typeof v !== 'number') return { code: 'domain', message: 'is not a real number' };
    if (!Number.isFinite(v)) return { code: 'domain', message: `is not a finite number (${v})` };
    return { si: v, dim: [...value.dimensions] };
  }
  if (typeof value === 'boolean') return { code: 'invalid-field', message: 'gives true/false, not a number or quantity' };
  const type = typeof value === 'object' && value !== null ? ((value as { type?: string }).type ?? 'object') : typeof value;
  if (type === 'Complex') return { code: 'domain', message: 'is not a real number (e.g. the square root of a negative value)' };
  return { code: 'invalid-field', message: `gives a ${type}, not a number or quantity` };
}

/**
 * Evaluate an expression against a scope of named values (cells), giving a quantity in SI base
 * units. The scope is only read (expressions cannot assign). An expression that uses no
 * name bound in the scope is evaluated once and remembered.
 * @example evaluateExpression('18 kN / (40 mm * 12 mm)', new Map()) // { si: 37.5e6, dim: pressure }
 * @public
 */
export function evaluateExpression(text: string, scope: ReadonlyMap<string, unknown>): Quantity | ExpressionProblem {
  const compiled = compileExpression(text);
  if (compiled.problem || !compiled.code) return compiled.problem ?? { code: 'parse', message: 'cannot be compiled' };
  const bound = compiled.symbols.some((s) => scope.has(s));
  if (!bound) {
    const known = constants.get(text);
    if (known) return known;
  }
  const code = compiled.code;
  // mathjs only reads the scope here: assignments never compile (see inspect), so the caller's
  // map cannot change and no state survives from one evaluation to the next.
  const raw = tryMath(() => code.evaluate(scope as Map<string, unknown>) as unknown, 'evaluation');
  const result = isProblem(raw) ? raw : toQuantity(raw);
  if (!bound) {
    if (constants.size >= CACHE_LIMIT) constants.delete(constants.keys().next().value as string);
    constants.set(text, result);
  }
  return result;
}

/** True when the value is a problem rather than a quantity. @public */
export function isExpressionProblem(value: Quantity | ExpressionProblem): value is ExpressionProblem {
  return 'code' in value;
}

const templateCache = new Map<string, string>();

/**
 * The value a quantity takes in an expression scope: a plain number when dimensionless, else a
 * mathjs Unit in SI base units.
 * @public
 */
export function scopeValueOf(q: Quantity): unknown {
  let base = templateCache.get(q.dim.join(','));
  if (base === undefined) {
    base = baseUnitOf(q.dim);
    templateCache.set(q.dim.join(','), base);
  }
  return base === '' ? q.si : unitFromSI(q.si, base);
}
