import type { Measure } from '../units/measure';
import { isPlainLiteral, texExpression, texQuantity, texSubstituted } from './latex';
import type { EquationContext } from './types';

/** LaTeX for a referenced quantity cell's value in the display system, or undefined for other names. */
export function referencedValue(context: EquationContext): (name: string) => string | undefined {
  return (name) => {
    const r = context.lookup(name);
    if (!r || !r.ok || r.kind !== 'quantity') return undefined;
    const v = r.values.value;
    const m = r.measures.value;
    return typeof v === 'number' && m !== undefined ? texQuantity(v, m, context.system) : undefined;
  };
}

/**
 * One line of a substituted equation for an expression field:
 * `label = expression = expression with values = result`, shortened when the expression is a
 * plain literal (`label = 250 MPa`) or names no cell.
 */
export function fieldTex(label: string, expression: string, valueSI: number, measure: Measure, context: EquationContext): string {
  const result = texQuantity(valueSI, measure, context.system);
  if (isPlainLiteral(expression)) return `${label} = ${result}`;
  const parts = [label, texExpression(expression)];
  const substituted = texSubstituted(expression, referencedValue(context));
  if (substituted) parts.push(substituted);
  parts.push(result);
  return parts.join(' = ');
}
