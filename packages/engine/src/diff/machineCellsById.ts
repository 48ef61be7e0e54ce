import type { MachineCell, MachineOutput } from '../sheet/machineOutput';

/**
 * The machine output's entries by cell id. Machine output is keyed by cell name (`name@id` for a
 * name used twice, after its first use); this walks the cells in order with the same rule.
 * Cells without a name (notes) have no entry.
 * @example machineCellsById(sheet.cells, output).get('c1') // { kind: 'criterion', values: { factor: 1.85, ... } }
 * @public
 */
export function machineCellsById(
  cells: readonly { readonly id: string; readonly [field: string]: unknown }[],
  output: MachineOutput,
): Map<string, MachineCell> {
  const byId = new Map<string, MachineCell>();
  const seen = new Set<string>();
  for (const cell of cells) {
    if (typeof cell.name !== 'string') continue;
    const key = seen.has(cell.name) ? `${cell.name}@${cell.id}` : cell.name;
    seen.add(cell.name);
    const result = output.cells[key];
    if (result !== undefined) byId.set(cell.id, result);
  }
  return byId;
}
