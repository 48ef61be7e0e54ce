import { KINDS, type Cell } from '../kinds/registry';
import type { MaterialsLookup } from '../kinds/materials';
import type { CellResult } from '../kinds/result';
import type { ExpressionField } from '../kinds/types';
import type { UnitSystemId } from '../units/unitSystems';
import { compileExpression } from '../units/expression';
import { buildGraph, downstream, type GraphNode, type SheetGraph } from './graph';
import { checkCell, evaluateCell, type CheckedCell } from './evaluateCell';

/**
 * A cell as the evaluator accepts it: a valid cell, or anything with an id (a cell being edited
 * may not fit its schema yet; it then gets an `invalid-field` error value).
 * @public
 */
export type CellInput = Cell | { readonly id: string; readonly [field: string]: unknown };

/** The cells to evaluate; `title` and `unitSystem` do not affect evaluation. @public */
export interface SheetInput {
  readonly cells: readonly CellInput[];
}

/** Options of an evaluator. @public */
export interface EvaluatorOptions {
  /** Materials by id, for criterion and point-set cells that name a `material`. */
  readonly materials?: MaterialsLookup;
}

/** Which cells an edit re-evaluated, in evaluation order. @public */
export interface UpdateReport {
  readonly evaluated: readonly string[];
}

/**
 * Live evaluation of a sheet. `results` holds every cell's result by id, in sheet order; edits
 * re-evaluate only the edited cell and the cells downstream of it (and cells whose name clash or
 * reference changed with it), in dependency order. Same cells in, same results out.
 * @public
 */
export interface Evaluator {
  /** Result of every cell by id, in sheet order. */
  readonly results: ReadonlyMap<string, CellResult>;
  /** The cells, in sheet order, as last given. */
  readonly cells: readonly CellInput[];
  /** Total number of single-cell evaluations so far (for tests and diagnostics). */
  readonly evaluations: number;
  /** The result of the cell with this name. */
  resultByName(name: string): CellResult | undefined;
  /** The id of the cell with this name. */
  idOf(name: string): string | undefined;
  /** Replace the cell with the same id, or append it when the id is new. */
  update(cell: CellInput): UpdateReport;
  /** Insert a new cell at `index` (0-based); an existing id is moved there and replaced. */
  insert(cell: CellInput, index: number): UpdateReport;
  /** Remove a cell; its dependents then report an unknown name. */
  remove(id: string): UpdateReport;
  /** Replace the materials list; cells that use a material are re-evaluated. */
  setMaterials(materials: MaterialsLookup | undefined): UpdateReport;
  /**
   * The cell's governing equation with its numbers substituted, as a LaTeX string for KaTeX, in
   * the given unit system; null for notes, failed cells and unknown ids.
   */
  equation(id: string, system: UnitSystemId): string | null;
}

interface Entry {
  readonly raw: CellInput;
  readonly checked: CheckedCell;
  readonly node: GraphNode;
}

function entryOf(raw: CellInput, index: number): Entry {
  const checked = checkCell(raw, `#${index}`);
  let expressions: readonly ExpressionField[] = [];
  let references: readonly ExpressionField[] = [];
  let name: string | null;
  if (checked.ok) {
    const kind = KINDS[checked.cell.kind];
    expressions = kind.expressions(checked.cell as never);
    references = kind.references(checked.cell as never);
    name = 'name' in checked.cell ? checked.cell.name : null;
  } else {
    // A cell that fails its schema keeps its name, so references to it report `upstream`
    // rather than an unknown name.
    name = checked.name;
  }
  return { raw, checked, node: { id: checked.id, name, expressions, references } };
}

/** True when two versions of a cell have the same place in the graph: name, symbols per field, references. */
function sameShape(a: GraphNode, b: GraphNode): boolean {
  if (a.id !== b.id || a.name !== b.name || a.expressions.length !== b.expressions.length) return false;
  if (a.references.length !== b.references.length) return false;
  for (let i = 0; i < a.references.length; i++) {
    if (a.references[i]![0] !== b.references[i]![0] || a.references[i]![1] !== b.references[i]![1]) return false;
  }
  for (let i = 0; i < a.expressions.length; i++) {
    if (a.expressions[i]![0] !== b.expressions[i]![0]) return false;
    const x = compileExpression(a.expressions[i]![1]).symbols;
    const y = compileExpression(b.expressions[i]![1]).symbols;
    if (x.length !== y.length || x.some((s, k) => s !== y[k])) return false;
  }
  return true;
}

/**
 * Create an evaluator and evaluate the whole sheet.
 * @example
 *   const ev = createEvaluator(sheet);
 *   ev.results.get('k6');                 // { ok: true, values: { p1: 47656098, ... } }
 *   ev.update({ ...cell, expr: '20 kN' }); // { evaluated: ['k2', 'k4', 'k5', 'k6', 'k7'] }
 * @public
 */
export function createEvaluator(sheet: SheetInput, options: EvaluatorOptions = {}): Evaluator {
  let entries: Entry[] = sheet.cells.map(entryOf);
  let materials = options.materials;
  let graph: SheetGraph = buildGraph(entries.map((e) => e.node));
  let results = new Map<string, CellResult>();
  let evaluations = 0;

  const byId = () => new Map(entries.map((e) => [e.node.id, e]));
  let index = byId();

  const view = {
    get graph() {
      return graph;
    },
    result: (id: string) => results.get(id),
    get materials() {
      return materials;
    },
  };

  /**
   * Evaluate the given cells in graph order; keep results in sheet order (`reorder` when cells
   * were added, removed or moved).
   */
  function run(dirty: ReadonlySet<string> | null, reorder = true): UpdateReport {
    const evaluated: string[] = [];
    for (const id of graph.order) {
      if (dirty && !dirty.has(id)) continue;
      const entry = index.get(id);
      if (!entry) continue;
      results.set(id, evaluateCell(entry.checked, view));
      evaluations++;
      evaluated.push(id);
    }
    if (!reorder) return { evaluated };
    const ordered = new Map<string, CellResult>();
    for (const e of entries) {
      const r = results.get(e.node.id);
      if (r) ordered.set(e.node.id, r);
    }
    results = ordered;
    return { evaluated };
  }

  /** Cells to re-evaluate after `changed` moved from `before` to the current graph. */
  function affected(before: SheetGraph, changed: readonly string[], names: readonly (string | null)[]): Set<string> {
    const seeds = new Set(changed.filter((id) => index.has(id)));
    for (const name of names) {
      if (name === null) continue;
      for (const e of entries) if (e.node.name === name) seeds.add(e.node.id);
    }
    // Cells that depended on the old version (a renamed or removed name, a broken cycle), and
    // everything downstream of them and of the seeds in the new graph.
    for (const id of downstream(before, changed)) if (index.has(id)) seeds.add(id);
    return downstream(graph, seeds);
  }

  function rebuild(): SheetGraph {
    const before = graph;
    index = byId();
    graph = buildGraph(entries.map((e) => e.node));
    return before;
  }

  run(null);

  const evaluator: Evaluator = {
    get results() {
      return results;
    },
    get cells() {
      return entries.map((e) => e.raw);
    },
    get evaluations() {
      return evaluations;
    },
    resultByName(name) {
      const id = graph.owner.get(name);
      return id === undefined ? undefined : results.get(id);
    },
    idOf: (name) => graph.owner.get(name),
    update(cell) {
      const position = entries.findIndex((e) => e.node.id === cell.id);
      return position < 0 ? evaluator.insert(cell, entries.length) : replaceAt(position, cell);
    },
    insert(cell, at) {
      const old = entries.find((e) => e.node.id === cell.id);
      const without = entries.filter((e) => e.node.id !== cell.id);
      const position = Math.max(0, Math.min(at, without.length));
      const entry = entryOf(cell, position);
      entries = [...without.slice(0, position), entry, ...without.slice(position)];
      const before = rebuild();
      return run(affected(before, [entry.node.id], [old?.node.name ?? null, entry.node.name]));
    },
    remove(id) {
      const old = entries.find((e) => e.node.id === id);
      if (!old) return { evaluated: [] };
      entries = entries.filter((e) => e.node.id !== id);
      results.delete(id);
      const before = rebuild();
      return run(affected(before, [id], [old.node.name]));
    },
    equation: () => null,
    setMaterials(next) {
      materials = next;
      const users = entries
        .filter((e) => e.checked.ok && 'material' in e.checked.cell && e.checked.cell.material !== undefined)
        .map((e) => e.node.id);
      return run(downstream(graph, users));
    },
  };

  evaluator.equation = (id, system) => {
    const entry = index.get(id);
    const result = results.get(id);
    if (!entry || !entry.checked.ok || !result || !result.ok) return null;
    const cell = entry.checked.cell;
    return KINDS[cell.kind].equation(cell as never, result, { system, lookup: (name) => evaluator.resultByName(name) });
  };

  function replaceAt(position: number, cell: CellInput): UpdateReport {
    const old = entries[position]!;
    // An unchanged cell (a collaborator's echo, a re-sent edit) needs no evaluation at all.
    if (old.raw === cell || JSON.stringify(old.raw) === JSON.stringify(cell)) return { evaluated: [] };
    const entry = entryOf(cell, position);
    entries = entries.map((e, i) => (i === position ? entry : e));
    if (sameShape(old.node, entry.node)) {
      // The commonest edit, a new number: same name, same symbols, same references, so the
      // graph and the order of results stay as they are.
      index.set(entry.node.id, entry);
      return run(downstream(graph, [entry.node.id]), false);
    }
    const before = rebuild();
    return run(affected(before, [entry.node.id], [old.node.name, entry.node.name]));
  }

  return evaluator;
}
