import type { KindId } from '../kinds/kindIds';
import type { CellErrorCode, CellResult, ResultValue } from '../kinds/result';

/** One named cell in machine output. @public */
export interface MachineCell {
  readonly kind: KindId | null;
  readonly values?: Readonly<Record<string, ResultValue>>;
  readonly error?: { readonly code: CellErrorCode; readonly message: string; readonly rootCellId?: string };
}

/**
 * Machine output of a sheet's results (`sheaf eval FILE --json`): one entry per named cell, by
 * name, numbers in SI base units; a factor with no finite value is `null` with `unbounded: true`.
 * A name held by more than one cell appears once as the name and then as `name@id`.
 * @public
 */
export interface MachineOutput {
  readonly cells: Readonly<Record<string, MachineCell>>;
}

/**
 * Build the machine output from the cells (for their names) and their results, in sheet order.
 * @public
 */
export function machineOutput(
  cells: readonly { readonly id: string; readonly [field: string]: unknown }[],
  results: ReadonlyMap<string, CellResult>,
): MachineOutput {
  const out: Record<string, MachineCell> = {};
  for (const cell of cells) {
    if (typeof cell.name !== 'string') continue;
    const result = results.get(cell.id);
    if (!result) continue;
    const key = Object.prototype.hasOwnProperty.call(out, cell.name) ? `${cell.name}@${cell.id}` : cell.name;
    out[key] = result.ok
      ? { kind: result.kind, values: result.values }
      : {
          kind: result.kind,
          error: result.error.rootCellId
            ? { code: result.error.code, message: result.error.message, rootCellId: result.error.rootCellId }
            : { code: result.error.code, message: result.error.message },
        };
  }
  return { cells: out };
}
