import { STATE_KINDS, isKindId, type KindId } from '../kinds/kindIds';
import type { MaterialsLookup } from '../kinds/materials';
import { KINDS, cellSchema, type Cell } from '../kinds/registry';
import { cellFailure, type CellFailure, type CellOk, type CellResult } from '../kinds/result';
import type { KindContext } from '../kinds/types';
import type { StressTensor } from '../stress/types';
import { describeIssues } from '../format/issues';
import { checkDimension, type ExpectedDimension } from '../units/checkDimension';
import { evaluateExpression, isExpressionProblem, type Quantity } from '../units/expression';
import type { Reference, SheetGraph } from './graph';
import { scopeValueOfResult } from './scopeValue';

/** A cell as given, checked against its kind's schema. */
export type CheckedCell =
  | { readonly ok: true; readonly id: string; readonly cell: Cell }
  | { readonly ok: false; readonly id: string; readonly kind: KindId | null; readonly name: string | null; readonly failure: CellFailure };

/**
 * Check a cell against the schema of its kind; a cell that does not fit becomes an
 * `invalid-field` failure naming the field (`sx: must be a string`).
 */
export function checkCell(raw: unknown, fallbackId: string): CheckedCell {
  const record = (typeof raw === 'object' && raw !== null ? raw : {}) as Record<string, unknown>;
  const id = typeof record.id === 'string' && record.id !== '' ? record.id : fallbackId;
  const kind = isKindId(record.kind) ? record.kind : null;
  const name = typeof record.name === 'string' ? record.name : null;
  const parsed = cellSchema.safeParse(raw);
  if (parsed.success) return { ok: true, id, cell: parsed.data };
  const message = describeIssues(parsed.error.issues)[0] ?? 'does not fit its kind';
  return { ok: false, id, kind, name, failure: cellFailure(id, kind, 'invalid-field', message) };
}

/** What evaluating one cell needs from the sheet. */
export interface SheetView {
  readonly graph: SheetGraph;
  result(id: string): CellResult | undefined;
  readonly materials: MaterialsLookup | undefined;
}

const STATE_WORDS = 'a stress, rosette, rotate or principal cell';

/**
 * Evaluate one cell in its sheet. Problems found in the graph come first, in this order: schema,
 * cycle, duplicate name, unknown name, failed reference (`upstream`, pointing at the root cause);
 * then the kind evaluates with a context that checks every field. Never throws.
 */
export function evaluateCell(checked: CheckedCell, view: SheetView): CellResult {
  if (!checked.ok) return checked.failure;
  const { cell, id } = checked;
  const { graph } = view;
  const cycle = graph.cycles.get(id);
  if (cycle) {
    const refs = graph.references.get(id) ?? [];
    const back = refs.find((r) => r.target !== null && graph.cycles.has(r.target));
    const field = back ? `${back.field}: ` : '';
    return cellFailure(id, cell.kind, 'cycle', `${field}reference cycle ${[...cycle, cycle[0]].join(' → ')}`);
  }
  const others = graph.duplicates.get(id);
  if (others && 'name' in cell) {
    return cellFailure(id, cell.kind, 'duplicate-name', `name: another cell (${others.join(', ')}) is also named "${cell.name}"`);
  }
  const references = graph.references.get(id) ?? [];
  const unknown = references.find((r) => r.target === null);
  if (unknown) {
    return cellFailure(id, cell.kind, 'unknown-name', `${unknown.field}: no cell named "${unknown.name}"`);
  }
  for (const r of references) {
    const upstream = view.result(r.target!);
    if (upstream && !upstream.ok) {
      const root = upstream.error.rootCellId ?? upstream.cellId;
      const cause = upstream.error.code === 'upstream' ? 'an error upstream' : `an error (${upstream.error.code})`;
      return cellFailure(id, cell.kind, 'upstream', `${r.field}: ${r.name} has ${cause}; see cell ${root}`, root);
    }
  }
  return KINDS[cell.kind].evaluate(cell as never, makeContext(id, cell.kind, references, view));
}

function makeContext(cellId: string, kind: KindId, references: readonly Reference[], view: SheetView): KindContext {
  let scope: Map<string, unknown> | null = null;
  const byName = new Map<string, CellOk>();
  for (const r of references) {
    const res = r.target === null ? undefined : view.result(r.target);
    if (res?.ok) byName.set(r.name, res);
  }
  const scopeOf = (): Map<string, unknown> => {
    if (!scope) {
      scope = new Map();
      for (const [name, res] of byName) scope.set(name, scopeValueOfResult(res));
    }
    return scope;
  };
  const quantity = (field: string, expression: string): Quantity | CellFailure => {
    const q = evaluateExpression(expression, scopeOf());
    if (isExpressionProblem(q)) return cellFailure(cellId, kind, q.code, `${field}: ${q.message}`);
    return q;
  };
  return {
    cellId,
    materials: view.materials,
    lookup: (name) => byName.get(name),
    quantity,
    value(field: string, expression: string, expected: ExpectedDimension) {
      const q = quantity(field, expression);
      if ('ok' in q) return q;
      const mismatch = checkDimension(field, q.dim, expected);
      return mismatch ? cellFailure(cellId, kind, 'unit-mismatch', mismatch) : q.si;
    },
    state(field: string, name: string): StressTensor | CellFailure {
      const res = byName.get(name);
      if (!res) return cellFailure(cellId, kind, 'unknown-name', `${field}: no cell named "${name}"`);
      if (!STATE_KINDS.includes(res.kind) || !res.state) {
        return cellFailure(cellId, kind, 'invalid-field', `${field}: "${name}" is a ${res.kind} cell; give ${STATE_WORDS}`);
      }
      return res.state;
    },
  };
}
