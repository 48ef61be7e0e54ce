import { useMemo } from 'react';
import { materialsLookupOf, type MaterialsLookup } from '@sheaf/engine';
import { useMaterials } from './useMaterials';

/**
 * The engine's MaterialsLookup for an organization's library, for `createEvaluator(sheet, {
 * materials })` or `evaluator.setMaterials(...)`; undefined until the library has loaded (cells
 * that name a material then report `unknown-material`, and are re-evaluated once it arrives).
 * For an issued revision use its frozen materials instead (`materialsLookupOf(Object.values(frozen))`).
 */
export function useMaterialsLookup(organizationId: string): MaterialsLookup | undefined {
  const { data } = useMaterials(organizationId);
  return useMemo(() => (data ? materialsLookupOf(data) : undefined), [data]);
}
