/**
 * The materials library in the browser. For the sheet editor: `MaterialPicker` (the material
 * choice of a criterion or point-set cell, with the values used and their sources),
 * `MaterialValues` (the values and sources alone), `useMaterials(orgId)` and
 * `useMaterialsLookup(orgId)` (the engine's MaterialsLookup for the evaluator).
 */
export { MaterialPicker } from './MaterialPicker';
export type { MaterialPickerProps } from './MaterialPicker';
export { MaterialValues } from './MaterialValues';
export { useMaterials } from './useMaterials';
export { useMaterialsLookup } from './useMaterialsLookup';
