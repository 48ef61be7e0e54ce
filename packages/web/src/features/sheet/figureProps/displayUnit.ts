import { UNIT_SYSTEMS, type UnitSystemId } from '@sheaf/engine';
import type { DisplayUnit } from '../figures/figureTypes';

/** The stress unit of a unit system as the figures take it (MPa or ksi). */
export function stressDisplayUnit(system: UnitSystemId): DisplayUnit {
  const unit = UNIT_SYSTEMS[system].pressure;
  if (!unit) return { label: 'Pa', perPa: 1 };
  return { label: unit.label, perPa: 1 / unit.siPerUnit };
}
