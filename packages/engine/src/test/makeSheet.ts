/** Shared builders for cross-module tests: evaluate a few cells and read results by name. */
import type { MaterialsLookup } from '../kinds/materials';
import type { CellError, CellOk } from '../kinds/result';
import { createEvaluator, type CellInput, type Evaluator } from '../sheet/createEvaluator';

let counter = 0;

/** Cells without ids get `c1`, `c2`, ... so tests can write them short. */
export function makeSheet(cells: readonly Readonly<Record<string, unknown>>[], materials?: MaterialsLookup): Evaluator {
  const withIds = cells.map((c) => ({ ...c, id: typeof c.id === 'string' ? c.id : `c${++counter}` })) as CellInput[];
  return createEvaluator({ cells: withIds }, materials ? { materials } : {});
}

/** The ok result of the cell with this name; fails the test with the error otherwise. */
export function okOf(ev: Evaluator, name: string): CellOk {
  const r = ev.resultByName(name);
  if (!r) throw new Error(`no cell named ${name}`);
  if (!r.ok) throw new Error(`${name} failed: ${r.error.code}: ${r.error.message}`);
  return r;
}

/** The error of the cell with this name; fails the test when it evaluated. */
export function errorOf(ev: Evaluator, name: string): CellError {
  const r = ev.resultByName(name);
  if (!r) throw new Error(`no cell named ${name}`);
  if (r.ok) throw new Error(`${name} evaluated to ${JSON.stringify(r.values)}, expected an error`);
  return r.error;
}

/** A numeric value of a result. */
export function num(result: CellOk, key: string): number {
  const v = result.values[key];
  if (typeof v !== 'number') throw new Error(`${key} is ${JSON.stringify(v)}, not a number`);
  return v;
}
