import { checkTemplateParameters, type TemplateParameter } from '@sheaf/engine';

/** One quantity cell of a sheet as the save-as-template form lists it. */
export interface ParameterRow {
  cellId: string;
  name: string;
  expr: string;
  /** Whether the cell becomes a parameter. */
  chosen: boolean;
  label: string;
  unit: string;
  min: string;
  max: string;
  hint: string;
}

interface CellLike {
  readonly id: string;
  readonly kind: string;
  readonly [field: string]: unknown;
}

const LEADING_NUMBER = /^\s*[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?\s*/i;

/** The unit written after the number of a plain value (`20 MPa` gives `MPa`, `0.33` gives ''), or null for a formula. */
export function unitOfValue(expr: string): string | null {
  const match = LEADING_NUMBER.exec(expr);
  if (!match) return null;
  const rest = expr.slice(match[0].length).trim();
  if (rest === '') return '';
  return /^[A-Za-z][A-Za-z0-9^/ *.]*$/.test(rest) && !/[+-]/.test(rest) ? rest : null;
}

/**
 * The quantity cells of a sheet as rows: those that are parameters already (with their
 * definitions), then the others. A cell holding a plain value (a number with a unit) is offered
 * with that unit; a cell holding a formula of other cells is listed but not chosen.
 */
export function parameterRows(cells: readonly CellLike[], existing: readonly TemplateParameter[] = []): ParameterRow[] {
  return cells
    .filter((c) => c.kind === 'quantity' && typeof c.name === 'string')
    .map((c) => {
      const expr = typeof c.expr === 'string' ? c.expr : '';
      const defined = existing.find((p) => p.cellId === c.id);
      const unit = unitOfValue(expr);
      return {
        cellId: c.id,
        name: c.name as string,
        expr,
        chosen: Boolean(defined),
        label: defined?.label ?? '',
        unit: defined?.unit ?? unit ?? '',
        min: defined?.min ?? '',
        max: defined?.max ?? '',
        hint: defined?.hint ?? '',
      };
    });
}

/** The chosen rows as parameters (empty texts left out; the label defaults to the cell's name). */
export function parametersOfRows(rows: readonly ParameterRow[]): TemplateParameter[] {
  return rows
    .filter((r) => r.chosen)
    .map((r) => ({
      cellId: r.cellId,
      name: r.name,
      label: r.label.trim() || r.name,
      unit: r.unit.trim(),
      ...(r.min.trim() ? { min: r.min.trim() } : {}),
      ...(r.max.trim() ? { max: r.max.trim() } : {}),
      ...(r.hint.trim() ? { hint: r.hint.trim() } : {}),
    }));
}

/** Problems of the chosen parameters against the content, by cell id (and those without one). */
export function checkParameterRows(content: { cells: readonly CellLike[] }, rows: readonly ParameterRow[]): { byCell: Record<string, string>; other: string[] } {
  const parameters = parametersOfRows(rows);
  const byCell: Record<string, string> = {};
  const other: string[] = [];
  for (const problem of checkTemplateParameters(content, parameters)) {
    const index = /^parameters\[(\d+)\]/.exec(problem.field)?.[1];
    const name = /^parameters\.([A-Za-z0-9_]+)/.exec(problem.field)?.[1];
    const parameter = index !== undefined ? parameters[Number(index)] : parameters.find((p) => p.name === name);
    if (parameter && !(parameter.cellId in byCell)) byCell[parameter.cellId] = problem.message.replace(/^parameters(\[\d+\]|\.[A-Za-z0-9_]+)\.?/, '');
    else other.push(problem.message);
  }
  return { byCell, other };
}
