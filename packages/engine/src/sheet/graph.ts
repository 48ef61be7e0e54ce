import { isFreeStandingSymbol, compileExpression } from '../units/expression';

/** What the graph needs to know about one cell. */
export interface GraphNode {
  readonly id: string;
  /** The cell's name; null for notes and for cells that failed their schema. */
  readonly name: string | null;
  /** Expression fields: [field, expression]. */
  readonly expressions: readonly (readonly [string, string])[];
  /** Direct references (`of`): [field, name]. */
  readonly references: readonly (readonly [string, string])[];
}

/** A reference from a cell to a name, resolved or not. */
export interface Reference {
  readonly field: string;
  readonly name: string;
  /** The id of the cell with that name, or null when no cell has it. */
  readonly target: string | null;
}

/** The dependency graph of a sheet. */
export interface SheetGraph {
  /** Evaluation order: every cell after the cells it depends on (cycle members in sheet order). */
  readonly order: readonly string[];
  /** Cell id by name (the first cell with that name). */
  readonly owner: ReadonlyMap<string, string>;
  /** Cells whose name another cell also has: id -> the other ids. */
  readonly duplicates: ReadonlyMap<string, readonly string[]>;
  /** References of each cell, in field order. Units and allowed constants are left out. */
  readonly references: ReadonlyMap<string, readonly Reference[]>;
  /** Cells that depend directly on each cell. */
  readonly dependents: ReadonlyMap<string, readonly string[]>;
  /** Cells in a reference cycle: id -> the names around the cycle. */
  readonly cycles: ReadonlyMap<string, readonly string[]>;
}

/**
 * Build the dependency graph. A symbol of an expression is a reference when a cell has that
 * name (a cell named like a unit shadows the unit: `A` is the cell A, not the ampere); else when
 * it is a unit or an allowed constant it is not a reference; else it is an unknown name
 * (target null). Names in `of` fields are always references. Cycles are found as strongly
 * connected components (Tarjan, iterative); the order is a depth-first post-order in sheet order,
 * so it is the same for the same sheet on every run.
 */
export function buildGraph(nodes: readonly GraphNode[]): SheetGraph {
  const owner = new Map<string, string>();
  const holders = new Map<string, string[]>();
  for (const node of nodes) {
    if (node.name === null) continue;
    if (!owner.has(node.name)) owner.set(node.name, node.id);
    const list = holders.get(node.name) ?? [];
    list.push(node.id);
    holders.set(node.name, list);
  }
  const duplicates = new Map<string, string[]>();
  for (const ids of holders.values()) {
    if (ids.length < 2) continue;
    for (const id of ids) duplicates.set(id, ids.filter((other) => other !== id));
  }

  const references = new Map<string, Reference[]>();
  const edges = new Map<string, string[]>();
  for (const node of nodes) {
    const refs: Reference[] = [];
    const seen = new Set<string>();
    const add = (field: string, name: string, direct: boolean) => {
      const target = owner.get(name) ?? null;
      if (target === null && !direct && isFreeStandingSymbol(name)) return;
      const key = `${field}\u0000${name}`;
      if (seen.has(key)) return;
      seen.add(key);
      refs.push({ field, name, target });
    };
    for (const [field, text] of node.expressions) for (const s of compileExpression(text).symbols) add(field, s, false);
    for (const [field, name] of node.references) add(field, name, true);
    references.set(node.id, refs);
    edges.set(node.id, [...new Set(refs.flatMap((r) => (r.target === null ? [] : [r.target])))]);
  }

  const dependents = new Map<string, string[]>();
  for (const node of nodes) dependents.set(node.id, []);
  for (const [id, targets] of edges) for (const t of targets) dependents.get(t)?.push(id);

  const nameOf = new Map(nodes.map((n) => [n.id, n.name ?? n.id]));
  const cycles = new Map<string, string[]>();
  for (const component of stronglyConnected(nodes.map((n) => n.id), edges)) {
    const selfLoop = component.length === 1 && edges.get(component[0]!)!.includes(component[0]!);
    if (component.length < 2 && !selfLoop) continue;
    const names = component.map((id) => nameOf.get(id)!);
    for (const id of component) cycles.set(id, names);
  }

  return { order: postOrder(nodes.map((n) => n.id), edges), owner, duplicates, references, dependents, cycles };
}

/** Depth-first post-order (dependencies first), iterative, starting from each id in sheet order. */
function postOrder(ids: readonly string[], edges: ReadonlyMap<string, readonly string[]>): string[] {
  const order: string[] = [];
  const state = new Map<string, 1 | 2>();
  for (const start of ids) {
    if (state.has(start)) continue;
    const stack: [string, number][] = [[start, 0]];
    state.set(start, 1);
    while (stack.length) {
      const top = stack[stack.length - 1]!;
      const next = edges.get(top[0])!;
      if (top[1] < next.length) {
        const child = next[top[1]++]!;
        if (!state.has(child)) {
          state.set(child, 1);
          stack.push([child, 0]);
        }
      } else {
        state.set(top[0], 2);
        order.push(top[0]);
        stack.pop();
      }
    }
  }
  return order;
}

/** Tarjan's strongly connected components, iterative; components in sheet order of their members. */
function stronglyConnected(ids: readonly string[], edges: ReadonlyMap<string, readonly string[]>): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const components: string[][] = [];
  const position = new Map(ids.map((id, i) => [id, i]));
  let counter = 0;
  for (const root of ids) {
    if (index.has(root)) continue;
    const work: [string, number][] = [[root, 0]];
    index.set(root, counter);
    low.set(root, counter++);
    stack.push(root);
    onStack.add(root);
    while (work.length) {
      const frame = work[work.length - 1]!;
      const [v] = frame;
      const next = edges.get(v)!;
      if (frame[1] < next.length) {
        const w = next[frame[1]++]!;
        if (!index.has(w)) {
          index.set(w, counter);
          low.set(w, counter++);
          stack.push(w);
          onStack.add(w);
          work.push([w, 0]);
        } else if (onStack.has(w)) {
          low.set(v, Math.min(low.get(v)!, index.get(w)!));
        }
        continue;
      }
      work.pop();
      if (work.length) {
        const parent = work[work.length - 1]![0];
        low.set(parent, Math.min(low.get(parent)!, low.get(v)!));
      }
      if (low.get(v) === index.get(v)) {
        const component: string[] = [];
        let w: string;
        do {
          w = stack.pop()!;
          onStack.delete(w);
          component.push(w);
        } while (w !== v);
        components.push(component.sort((a, b) => position.get(a)! - position.get(b)!));
      }
    }
  }
  return components;
}

/** Every cell downstream of the given cells (following dependents), the given cells included. */
export function downstream(graph: SheetGraph, from: Iterable<string>): Set<string> {
  const out = new Set<string>();
  const queue = [...from];
  while (queue.length) {
    const id = queue.pop()!;
    if (out.has(id)) continue;
    out.add(id);
    for (const d of graph.dependents.get(id) ?? []) if (!out.has(d)) queue.push(d);
  }
  return out;
}
