import { createEvaluator, type CellResult, type Evaluator, type MaterialsLookup, type UnitSystemId } from '@sheaf/engine';
import { cellFromDoc, sheetCells, sheetOrder } from '@sheaf/sheet-doc';
import type * as Y from 'yjs';
import { orderedCellIds } from '../doc/cellOrder';

/**
 * The live results of a sheet, kept in step with its Y.Doc by the engine's incremental
 * evaluator. Every transaction on the document (a keystroke here, an edit arriving from someone
 * else, a cell added, moved or deleted) is mapped to `update` / `insert` / `remove` of the cells
 * it touched; only those cells and the ones downstream are evaluated again. Nothing waits for
 * the server: a local edit is evaluated in the same tick it is typed.
 */
export interface SheetEvaluatorStore {
  /**
   * Start following the document (counted: the last `detach` stops it). Subscribing attaches
   * too. Attaching again after a pause first catches up with whatever changed meanwhile.
   */
  attach(): () => void;
  /** Called after any evaluation; use for things that depend on the whole sheet (names). */
  subscribe(listener: () => void): () => void;
  /** Called when this cell's result may have changed. */
  subscribeCell(cellId: string, listener: () => void): () => void;
  result(cellId: string): CellResult | undefined;
  /** The governing equation with numbers in, as LaTeX; null for notes and failed cells. */
  equation(cellId: string, system: UnitSystemId): string | null;
  /** Names of the cells, in sheet order (for completion and unknown-name marking). */
  names(): readonly string[];
  /** Id, kind and name of every cell, in sheet order (a new array only after a pass). */
  summary(): readonly CellSummary[];
  /** Grows by one with every evaluation pass. */
  version(): number;
  /** Ids evaluated by the last pass, in evaluation order (diagnostics and tests). */
  lastEvaluated(): readonly string[];
  readonly evaluator: Evaluator;
  /**
   * Give the organization's materials library (or a revision's frozen materials); the cells that
   * name a material, and their dependents, are evaluated again.
   */
  setMaterials(materials: MaterialsLookup | undefined): void;
  /** Stop observing the document, whoever is still subscribed. */
  destroy(): void;
}

/** A cell as lists of cells need it. */
export interface CellSummary {
  readonly id: string;
  readonly kind: string;
  /** '' for notes and cells whose name is being typed. */
  readonly name: string;
}

/**
 * Evaluate `doc` now; follow its changes while attached (or subscribed to). Creating the store
 * has no side effect, so it may be created during render.
 */
export function createSheetEvaluatorStore(doc: Y.Doc): SheetEvaluatorStore {
  const cells = sheetCells(doc);
  const order = sheetOrder(doc);
  const evaluator = createEvaluator({
    cells: orderedCellIds(doc).flatMap((id) => {
      const cell = cellFromDoc(doc, id);
      return cell ? [cell] : [];
    }),
  });

  const listeners = new Set<() => void>();
  const cellListeners = new Map<string, Set<() => void>>();
  let version = 0;
  let names = namesOf(evaluator);
  let summary: readonly CellSummary[] = [];
  let summaryKey = '';
  let summaryStale = true;
  let lastEvaluated: readonly string[] = [];
  const equations = new WeakMap<CellResult, Map<UnitSystemId, string | null>>();
  let materials: MaterialsLookup | undefined;

  // Collected while a transaction's observers run, applied once after it.
  const touched = new Set<string>();
  let orderChanged = false;

  const onCells = (events: Y.YEvent<Y.AbstractType<unknown>>[]) => {
    for (const event of events) {
      if (event.target === cells) {
        for (const key of event.changes.keys.keys()) touched.add(key);
      } else {
        const id = event.path[0];
        if (typeof id === 'string') touched.add(id);
      }
    }
  };
  const onOrder = () => {
    orderChanged = true;
  };
  const afterTransaction = () => {
    if (touched.size === 0 && !orderChanged) return;
    const changed = [...touched];
    const reorder = orderChanged;
    touched.clear();
    orderChanged = false;
    apply(changed, reorder);
  };

  let attachments = 0;
  function attach(): () => void {
    if (attachments++ === 0) {
      cells.observeDeep(onCells);
      order.observe(onOrder);
      doc.on('afterTransaction', afterTransaction);
      catchUp();
    }
    let attached = true;
    return () => {
      if (!attached) return;
      attached = false;
      if (--attachments === 0) stopObserving();
    };
  }
  function stopObserving() {
    cells.unobserveDeep(onCells);
    order.unobserve(onOrder);
    doc.off('afterTransaction', afterTransaction);
  }

  /** Evaluate whatever changed while nobody was attached (cells compared as file JSON). */
  function catchUp() {
    const target = orderedCellIds(doc);
    const given = new Map(evaluator.cells.map((cell) => [cell.id, JSON.stringify(cell)]));
    const changed = target.filter((id) => given.get(id) !== JSON.stringify(cellFromDoc(doc, id)));
    const gone = [...given.keys()].some((id) => !target.includes(id));
    const moved = evaluator.cells.some((cell, index) => target[index] !== cell.id);
    if (changed.length > 0 || gone || moved) apply(changed, true);
  }

  function apply(changed: readonly string[], reorder: boolean) {
    const evaluated: string[] = [];
    const notify = new Set<string>();
    const target = orderedCellIds(doc);
    const visible = new Set(target);
    const present = new Set(evaluator.cells.map((cell) => cell.id));

    for (const id of present) {
      if (visible.has(id)) continue;
      evaluated.push(...evaluator.remove(id).evaluated);
      notify.add(id);
    }
    for (const id of changed) {
      if (!visible.has(id)) continue;
      const cell = cellFromDoc(doc, id);
      if (!cell) continue;
      const report = present.has(id) ? evaluator.update(cell) : evaluator.insert(cell, target.indexOf(id));
      evaluated.push(...report.evaluated);
      notify.add(id);
    }
    if (reorder || changed.some((id) => !present.has(id))) {
      // Bring the evaluator's order in line; an insert of an existing id moves it there.
      for (let index = 0; index < target.length; index++) {
        const id = target[index]!;
        if (evaluator.cells[index]?.id === id) continue;
        const cell = cellFromDoc(doc, id);
        if (cell) evaluated.push(...evaluator.insert(cell, index).evaluated);
      }
    }
    for (const id of evaluated) notify.add(id);
    lastEvaluated = evaluated;
    // Same names, same array: components that list names re-render only when one changes.
    const nextNames = namesOf(evaluator);
    if (nextNames.join('\u0000') !== names.join('\u0000')) names = nextNames;
    summaryStale = true;
    version++;
    for (const id of notify) for (const listener of cellListeners.get(id) ?? []) listener();
    for (const listener of listeners) listener();
  }

  return {
    evaluator,
    attach,
    subscribe(listener) {
      listeners.add(listener);
      const detach = attach();
      return () => {
        listeners.delete(listener);
        detach();
      };
    },
    subscribeCell(cellId, listener) {
      let set = cellListeners.get(cellId);
      if (!set) cellListeners.set(cellId, (set = new Set()));
      set.add(listener);
      const detach = attach();
      return () => {
        set.delete(listener);
        if (set.size === 0) cellListeners.delete(cellId);
        detach();
      };
    },
    result: (cellId) => evaluator.results.get(cellId),
    equation(cellId, system) {
      const result = evaluator.results.get(cellId);
      if (!result) return null;
      let bySystem = equations.get(result);
      if (!bySystem) equations.set(result, (bySystem = new Map()));
      if (!bySystem.has(system)) bySystem.set(system, evaluator.equation(cellId, system));
      return bySystem.get(system) ?? null;
    },
    names: () => names,
    summary() {
      if (!summaryStale) return summary;
      summaryStale = false;
      const next = evaluator.cells.map((cell) => {
        const { id, kind, name } = cell as { id: string; kind?: unknown; name?: unknown };
        return { id, kind: typeof kind === 'string' ? kind : '', name: typeof name === 'string' ? name : '' };
      });
      const key = JSON.stringify(next);
      if (key !== summaryKey) {
        summary = next;
        summaryKey = key;
      }
      return summary;
    },
    version: () => version,
    lastEvaluated: () => lastEvaluated,
    setMaterials(next) {
      if (next === materials) return;
      materials = next;
      const { evaluated } = evaluator.setMaterials(next);
      lastEvaluated = evaluated;
      version++;
      for (const id of evaluated) for (const listener of cellListeners.get(id) ?? []) listener();
      for (const listener of listeners) listener();
    },
    destroy() {
      if (attachments > 0) stopObserving();
      attachments = 0;
      listeners.clear();
      cellListeners.clear();
    },
  };
}

function namesOf(evaluator: Evaluator): readonly string[] {
  const names: string[] = [];
  for (const cell of evaluator.cells) {
    const name = (cell as { name?: unknown }).name;
    if (typeof name === 'string' && name !== '') names.push(name);
  }
  return names;
}
