import type { MaterialsLookup } from '../kinds/materials';
import type { CellOk, ResultValue } from '../kinds/result';
import type { Measure } from '../units/measure';
import { isUnitSystemId, type UnitSystemId } from '../units/unitSystems';
import { createEvaluator } from '../sheet/createEvaluator';
import { formatResult } from '../sheet/formatResult';
import type { MachineCell } from '../sheet/machineOutput';
import { machineCellsById } from './machineCellsById';
import type { DiffValue, ResultChange, RevisionSnapshot, Verdict, VerdictCrossing } from './types';

type Cells = RevisionSnapshot['content']['cells'];

/** Options of {@link diffResults}. @public */
export interface DiffResultsOptions {
  /** Units to write the values in; the newer revision's unit system when absent. */
  readonly unitSystem?: UnitSystemId;
  /** Materials by id, so cells that name a material know what their values measure. */
  readonly materials?: MaterialsLookup;
  /**
   * Relative difference below which two numbers count as equal (default 1e-12): the stored
   * results of two revisions come from the same engine, so only round-off is forgiven.
   */
  readonly tolerance?: number;
}

/** Values not listed as changes of their own: `unbounded` travels with the factor it qualifies. */
const SKIPPED_KEYS = new Set(['unbounded']);

/**
 * Result values that moved between two revisions, for the cells present in both (by stable id),
 * in the newer revision's order, each with its old and new value formatted with units; and the
 * check cells whose verdict (`pass`) flipped. Values come from the stored results (the engine's
 * machine output, SI base units); the contents are evaluated only to learn what each value
 * measures, so a stress reads `130.91 MPa` and a factor of safety `1.8535`.
 * @example diffResults(rev1, rev2).crossings // [{ cellName: 'vonMises', from: 'pass', to: 'fail', ... }]
 * @public
 */
export function diffResults(
  older: RevisionSnapshot,
  newer: RevisionSnapshot,
  options: DiffResultsOptions = {},
): { results: ResultChange[]; crossings: VerdictCrossing[] } {
  const system = options.unitSystem ?? unitSystemOf(newer) ?? 'SI';
  const tolerance = options.tolerance ?? 1e-12;
  const oldResults = machineCellsById(older.content.cells, older.results);
  const newResults = machineCellsById(newer.content.cells, newer.results);
  const oldMeasures = measuresById(older.content.cells, options.materials);
  const newMeasures = measuresById(newer.content.cells, options.materials);

  const results: ResultChange[] = [];
  const crossings: VerdictCrossing[] = [];
  for (const cell of newer.content.cells) {
    const before = oldResults.get(cell.id);
    const after = newResults.get(cell.id);
    if (before === undefined || after === undefined) continue;
    const base = {
      cellId: cell.id,
      cellName: typeof cell.name === 'string' ? cell.name : cell.id,
      kind: typeof cell.kind === 'string' ? cell.kind : '',
    };
    const oldValues = before.values;
    const newValues = after.values;
    if (oldValues === undefined || newValues === undefined) {
      const oldText = outcomeText(before);
      const newText = outcomeText(after);
      if (oldText !== newText) {
        results.push({ ...base, key: null, old: word(oldText), new: word(newText), crossing: null });
      }
    } else {
      const oldShown = formatted(base.cellId, oldValues, oldMeasures.get(cell.id), system);
      const newShown = formatted(base.cellId, newValues, newMeasures.get(cell.id), system);
      const keys = [...new Set([...Object.keys(newValues), ...Object.keys(oldValues)])].filter((k) => !SKIPPED_KEYS.has(k));
      for (const key of keys) {
        const a = oldValues[key];
        const b = newValues[key];
        if (sameValue(a, b, tolerance) && oldValues.unbounded === newValues.unbounded) continue;
        const crossing = key === 'pass' && typeof a === 'boolean' && typeof b === 'boolean' ? (a ? 'pass-to-fail' : 'fail-to-pass') : null;
        results.push({ ...base, key, old: oldShown[key] ?? null, new: newShown[key] ?? null, crossing });
      }
    }
    const from = verdictOf(before);
    const to = verdictOf(after);
    if (from !== to && from !== 'none' && to !== 'none') {
      crossings.push({ ...base, from, to, direction: from === 'pass' ? 'pass-to-fail' : 'fail-to-pass' } as VerdictCrossing);
    }
  }
  return { results, crossings };
}

function unitSystemOf(snapshot: RevisionSnapshot): UnitSystemId | undefined {
  const system = snapshot.content.unitSystem;
  return typeof system === 'string' && isUnitSystemId(system) ? system : undefined;
}

function measuresById(cells: Cells, materials: MaterialsLookup | undefined): Map<string, Readonly<Record<string, Measure>>> {
  const evaluator = createEvaluator({ cells }, materials ? { materials } : {});
  const out = new Map<string, Readonly<Record<string, Measure>>>();
  for (const [id, result] of evaluator.results) if (result.ok) out.set(id, result.measures);
  return out;
}

function formatted(
  cellId: string,
  values: Readonly<Record<string, ResultValue>>,
  measures: Readonly<Record<string, Measure>> | undefined,
  system: UnitSystemId,
): Record<string, DiffValue> {
  // formatResult needs only the values and what they measure.
  const shaped = { ok: true, cellId, kind: 'quantity', values, measures: measures ?? {} } as CellOk;
  const out: Record<string, DiffValue> = {};
  for (const [key, f] of Object.entries(formatResult(shaped, system))) {
    const raw = values[key];
    out[key] = { text: f.text, si: typeof raw === 'number' ? raw : null, unit: f.unit };
  }
  return out;
}

function sameValue(a: ResultValue | undefined, b: ResultValue | undefined, tolerance: number): boolean {
  if (typeof a === 'number' && typeof b === 'number') return closeEnough(a, b, tolerance);
  if (Array.isArray(a) && Array.isArray(b)) {
    return a.length === b.length && a.every((x, i) => {
      const y = b[i];
      return typeof x === 'number' && typeof y === 'number' ? closeEnough(x, y, tolerance) : x === y;
    });
  }
  return a === b;
}

function closeEnough(a: number, b: number, tolerance: number): boolean {
  return a === b || Math.abs(a - b) <= tolerance * Math.max(Math.abs(a), Math.abs(b));
}

function outcomeText(result: MachineCell): string {
  return result.error ? `error (${result.error.code}): ${result.error.message}` : 'evaluated';
}

function word(text: string): DiffValue {
  return { text, si: null, unit: '' };
}

function verdictOf(result: MachineCell): Verdict {
  const pass = result.values?.pass;
  return typeof pass === 'boolean' ? (pass ? 'pass' : 'fail') : 'none';
}
