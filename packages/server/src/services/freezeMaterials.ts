import type { DataSource, EntityManager } from 'typeorm';
import { createEvaluator, machineOutput, materialsLookupOf, type MachineOutput, type MaterialsLookup } from '@sheaf/engine';
import type { FrozenMaterials } from '@sheaf/engine/api';
import { listMaterials } from './materials';

/**
 * Material values frozen into an issued revision (`FrozenMaterials` of the API): for each
 * material id the sheet names, the values with their basis and source as they were at issue.
 * Stored with the revision, they make its evaluation independent of later edits of the library.
 */
export type { FrozenMaterials };

interface ContentWithCells {
  readonly cells: readonly { readonly kind: string; readonly [field: string]: unknown }[];
}

/** The material ids named by the criterion and point-set cells of a sheet, each once, in sheet order. */
export function materialIdsOf(content: ContentWithCells): string[] {
  const ids: string[] = [];
  for (const cell of content.cells) {
    if ((cell.kind === 'criterion' || cell.kind === 'pointset') && typeof cell.material === 'string' && !ids.includes(cell.material)) {
      ids.push(cell.material);
    }
  }
  return ids;
}

/**
 * Freeze the materials a sheet uses: `{ materialId: values + basis + source }`, read from the
 * organization's library (built-ins and its own) now. An id the library does not hold is left out;
 * evaluating the sheet then reports `unknown-material` on the cell, as it does live.
 *
 * For the revision code: call inside the transaction that writes the revision, store the result
 * with it (jsonb), and evaluate the revision with {@link evaluateWithFrozenMaterials}.
 * @example const frozen = await freezeMaterials(manager, content, sheet.organizationId)
 */
export async function freezeMaterials(db: DataSource | EntityManager, content: ContentWithCells, organizationId: string): Promise<FrozenMaterials> {
  const wanted = new Set(materialIdsOf(content));
  const frozen: FrozenMaterials = {};
  if (wanted.size === 0) return frozen;
  for (const material of await listMaterials(db, organizationId)) {
    if (wanted.has(material.id)) frozen[material.id] = material;
  }
  return frozen;
}

/** The evaluator's materials lookup from frozen materials. */
export function frozenMaterialsLookup(frozen: FrozenMaterials): MaterialsLookup {
  return materialsLookupOf(Object.values(frozen));
}

/**
 * Evaluate a revision's content with its frozen materials (never the live library), giving the
 * engine's machine output (SI numbers by cell name).
 */
export function evaluateWithFrozenMaterials(content: ContentWithCells & { readonly cells: readonly { readonly id: string }[] }, frozen: FrozenMaterials): MachineOutput {
  const evaluator = createEvaluator(content as Parameters<typeof createEvaluator>[0], { materials: frozenMaterialsLookup(frozen) });
  return machineOutput(evaluator.cells, evaluator.results);
}
