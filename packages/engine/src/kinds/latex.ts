import { SymbolNode, type MathNode } from 'mathjs';
import { compileExpression } from '../units/expression';
import { formatNumber, formatQuantity } from '../units/formatQuantity';
import type { Measure } from '../units/measure';
import type { UnitSystemId } from '../units/unitSystems';

/** A number as LaTeX (exponent form as ×10^n). */
export function texPlain(value: number, digits = 5): string {
  const text = formatNumber(value, digits);
  const m = /^(-?[\d.]+)e([+-]\d+)$/.exec(text);
  if (m) return `${m[1]}\\times 10^{${Number(m[2])}}`;
  return text.replace('∞', '\\infty');
}

/** A value in the display unit of the system, number only (for substituted equations). */
export function texNumber(valueSI: number, measure: Measure, system: UnitSystemId): string {
  return texPlain(formatQuantity(valueSI, measure, system).value);
}

/** A value in the display unit of the system with its unit. */
export function texQuantity(valueSI: number, measure: Measure, system: UnitSystemId): string {
  return formatQuantity(valueSI, measure, system).latex;
}

/** Parenthesised number when negative, for substitution into a formula. */
export function texTerm(valueSI: number, measure: Measure, system: UnitSystemId): string {
  const t = texNumber(valueSI, measure, system);
  return t.startsWith('-') ? `\\left(${t}\\right)` : t;
}

/** A cell name as LaTeX (greek names become letters: sigma_a → σ_a). */
export function texName(name: string): string {
  return new SymbolNode(name).toTex();
}

/**
 * An expression as LaTeX; with `substitute`, names it returns LaTeX for are replaced (the
 * referenced cells' values). An expression that does not parse is shown as text.
 */
export function texExpression(expression: string, substitute?: (name: string) => string | undefined): string {
  const compiled = compileExpression(expression);
  if (!compiled.node) return `\\text{${expression.replace(/[\\{}$&#^_%~]/g, '')}}`;
  const handler = (node: MathNode): string | undefined => {
    if (!substitute || node.type !== 'SymbolNode') return undefined;
    const name = (node as unknown as { name: string }).name;
    const replacement = substitute(name);
    return replacement === undefined ? undefined : `\\left(${replacement}\\right)`;
  };
  return compiled.node.toTex({ handler } as never);
}

/**
 * The expression with the referenced cells' values put in, or null when it names no cell (then
 * the expression itself already shows the numbers). `valueOf` gives LaTeX for a cell name, or
 * undefined when the name is not a cell.
 */
export function texSubstituted(expression: string, valueOf: (name: string) => string | undefined): string | null {
  const compiled = compileExpression(expression);
  if (!compiled.node || !compiled.symbols.some((s) => valueOf(s) !== undefined)) return null;
  return texExpression(expression, valueOf);
}

/** True for a bare number, or a number times a unit (`250 MPa`): nothing to substitute or compute. */
export function isPlainLiteral(expression: string): boolean {
  const node = compileExpression(expression).node as (MathNode & { args?: MathNode[]; op?: string; fn?: string }) | null;
  if (!node) return false;
  if (node.type === 'ConstantNode') return true;
  if (node.type === 'OperatorNode' && node.fn === 'unaryMinus') return isPlainLiteral(expression.trim().replace(/^-/, ''));
  return (
    node.type === 'OperatorNode' &&
    node.fn === 'multiply' &&
    node.args?.length === 2 &&
    node.args[0]!.type === 'ConstantNode' &&
    node.args[1]!.type === 'SymbolNode'
  );
}
