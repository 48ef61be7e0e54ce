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
  /** True for a direct reference (`of`), false for a name in an expression. */
  readonly direct: boolean;
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
 * so it is the same for the same sheet on every run. Runs in O(cells + references) on integer
 * indexes: the evaluator rebuilds it on every edit.
 */
export function buildGraph(nodes: readonly GraphNode[]): SheetGraph {
  const n = nodes.length;
  const ownerIndex = new Map<string, number>();
  const owner = new Map<string, string>();
  const sharedNames: string[] = [];
  for (let i = 0; i < n; i++) {
    const name = nodes[i]!.name;
    if (name === null) continue;
    if (!ownerIndex.has(name)) {
      ownerIndex.set(name, i);
      owner.set(name, nodes[i]!.id);
    } else if (!sharedNames.includes(name)) {
      sharedNames.push(name);
    }
  }
  const duplicates = new Map<string, string[]>();
  for (const name of sharedNames) {
    const ids: string[] = [];
    for (let i = 0; i < n; i++) if (nodes[i]!.name === name) ids.push(nodes[i]!.id);
    for (const id of ids) duplicates.set(id, ids.filter((other) => other !== id));
  }

  const references = new Map<string, Reference[]>();
  const edges: number[][] = new Array<number[]>(n);
  for (let i = 0; i < n; i++) {
    const node = nodes[i]!;
    const refs: Reference[] = [];
    const targets: number[] = [];
    for (const [field, text] of node.expressions) {
      for (const symbol of compileExpression(text).symbols) addReference(refs, targets, nodes, ownerIndex, field, symbol, false);
    }
    for (const [field, name] of node.references) addReference(refs, targets, nodes, ownerIndex, field, name, true);
    references.set(node.id, refs);
    edges[i] = targets;
  }

  const dependentIndexes: number[][] = Array.from({ length: n }, () => []);
  for (let i = 0; i < n; i++) for (const t of edges[i]!) dependentIndexes[t]!.push(i);
  const dependents = new Map<string, string[]>();
  for (let i = 0; i < n; i++) dependents.set(nodes[i]!.id, dependentIndexes[i]!.map((d) => nodes[d]!.id));

  const cycles = new Map<string, string[]>();
  for (const component of stronglyConnected(n, edges)) {
    const selfLoop = component.length === 1 && edges[component[0]!]!.includes(component[0]!);
    if (component.length < 2 && !selfLoop) continue;
    const names = component.map((i) => nodes[i]!.name ?? nodes[i]!.id);
    for (const i of component) cycles.set(nodes[i]!.id, names);
  }

  const order = postOrder(n, edges).map((i) => nodes[i]!.id);
  return { order, owner, duplicates, references, dependents, cycles };
}

function addReference(
  refs: Reference[],
  targets: number[],
  nodes: readonly GraphNode[],
  ownerIndex: ReadonlyMap<string, number>,
  field: string,
  name: string,
  direct: boolean,
): void {
  const target = ownerIndex.get(name);
  if (target === undefined && !direct && isFreeStandingSymbol(name)) return;
  for (const r of refs) if (r.field === field && r.name === name) return;
  refs.push({ field, name, target: target === undefined ? null : nodes[target]!.id, direct });
  if (target !== undefined && !targets.includes(target)) targets.push(target);
}

/** Depth-first post-order (dependencies first), iterative, starting from each cell in sheet order. */
function postOrder(n: number, edges: readonly (readonly number[])[]): number[] {
  const order: number[] = [];
  const seen = new Uint8Array(n);
  const stack = new Int32Array(n);
  const next = new Int32Array(n);
  for (let start = 0; start < n; start++) {
    if (seen[start]) continue;
    let top = 0;
    stack[0] = start;
    next[0] = 0;
    seen[start] = 1;
    while (top >= 0) {
      const v = stack[top]!;
      const out = edges[v]!;
      if (next[top]! < out.length) {
        const w = out[next[top]!++]!;
        if (!seen[w]) {
          seen[w] = 1;
          top++;
          stack[top] = w;
          next[top] = 0;
        }
      } else {
        order.push(v);
        top--;
      }
    }
  }
  return order;
}

/** Tarjan's strongly connected components, iterative, on indexes; members sorted in sheet order. */
function stronglyConnected(n: number, edges: readonly (readonly number[])[]): number[][] {
  const index = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const onStack = new Uint8Array(n);
  const stack: number[] = [];
  const workNode = new Int32Array(n);
  const workNext = new Int32Array(n);
  const components: number[][] = [];
  let counter = 0;
  for (let root = 0; root < n; root++) {
    if (index[root] !== -1) continue;
    let top = 0;
    workNode[0] = root;
    workNext[0] = 0;
    index[root] = low[root] = counter++;
    stack.push(root);
    onStack[root] = 1;
    while (top >= 0) {
      const v = workNode[top]!;
      const out = edges[v]!;
      if (workNext[top]! < out.length) {
        const w = out[workNext[top]!++]!;
        if (index[w] === -1) {
          index[w] = low[w] = counter++;
          stack.push(w);
          onStack[w] = 1;
          top++;
          workNode[top] = w;
          workNext[top] = 0;
        } else if (onStack[w]) {
          low[v] = Math.min(low[v]!, index[w]!);
        }
        continue;
      }
      top--;
      if (top >= 0) {
        const parent = workNode[top]!;
        low[parent] = Math.min(low[parent]!, low[v]!);
      }
      if (low[v] === index[v]) {
        const component: number[] = [];
        let w: number;
        do {
          w = stack.pop()!;
          onStack[w] = 0;
          component.push(w);
        } while (w !== v);
        components.push(component.sort((a, b) => a - b));
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
