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
  for (const r of references) {
    if (r.target === null) return cellFailure(id, cell.kind, 'unknown-name', `${r.field}: no cell named "${r.name}"`);
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
  return new CellContext(cellId, kind, references, view);
}

/**
 * The context of one cell's evaluation. A class rather than an object of closures: a sheet
 * evaluates hundreds of cells, and methods on a prototype cost nothing per cell.
 */
class CellContext implements KindContext {
  private scope: Map<string, unknown> | null = null;
  private readonly byName = new Map<string, CellOk>();
  readonly materials: SheetView['materials'];

  constructor(
    readonly cellId: string,
    private readonly kind: KindId,
    private readonly references: readonly Reference[],
    view: SheetView,
  ) {
    this.materials = view.materials;
    for (const r of references) {
      const res = r.target === null ? undefined : view.result(r.target);
      if (res?.ok) this.byName.set(r.name, res);
    }
  }

  /** Only names written in expressions enter the scope; `of` references are read as results. */
  private scopeOf(): Map<string, unknown> {
    if (!this.scope) {
      this.scope = new Map();
      for (const r of this.references) {
        const res = this.byName.get(r.name);
        if (!r.direct && res && !this.scope.has(r.name)) this.scope.set(r.name, scopeValueOfResult(res));
      }
    }
    return this.scope;
  }

  lookup(name: string): CellOk | undefined {
    return this.byName.get(name);
  }

  quantity(field: string, expression: string): Quantity | CellFailure {
    const q = evaluateExpression(expression, this.scopeOf());
    if (isExpressionProblem(q)) return cellFailure(this.cellId, this.kind, q.code, `${field}: ${q.message}`);
    return q;
  }

  value(field: string, expression: string, expected: ExpectedDimension): number | CellFailure {
    const q = this.quantity(field, expression);
    if ('ok' in q) return q;
    const mismatch = checkDimension(field, q.dim, expected);
    return mismatch ? cellFailure(this.cellId, this.kind, 'unit-mismatch', mismatch) : q.si;
  }

  state(field: string, name: string): StressTensor | CellFailure {
    const res = this.byName.get(name);
    if (!res) return cellFailure(this.cellId, this.kind, 'unknown-name', `${field}: no cell named "${name}"`);
    if (!STATE_KINDS.includes(res.kind) || !res.state) {
      return cellFailure(this.cellId, this.kind, 'invalid-field', `${field}: "${name}" is a ${res.kind} cell; give ${STATE_WORDS}`);
    }
    return res.state;
  }
}
