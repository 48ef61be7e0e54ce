import type { DimensionName } from './dimension';
import { siValueOf } from './math';

/** Unit systems a sheet can be displayed in. @public */
export const UNIT_SYSTEM_IDS = ['SI', 'US'] as const;

/** A unit system id: `SI` (MPa, kN, mm) or `US` (US customary: ksi, kip, in). @public */
export type UnitSystemId = (typeof UNIT_SYSTEM_IDS)[number];

/** How a dimension is displayed: label for text, LaTeX for equations, and its size in SI base units. @public */
export interface DisplayUnit {
  readonly label: string;
  readonly latex: string;
  /** SI base units per display unit (1 MPa = 1e6). */
  readonly siPerUnit: number;
}

const unit = (label: string, latex: string, mathjsName: string): DisplayUnit => ({
  label,
  latex,
  siPerUnit: siValueOf(1, mathjsName),
});

/**
 * Display units of each named dimension per system. Values come from the same mathjs instance
 * that parses expressions, so 1 ksi here is exactly 1 ksi there.
 * @public
 */
export const UNIT_SYSTEMS: Readonly<Record<UnitSystemId, Readonly<Partial<Record<DimensionName, DisplayUnit>>>>> = {
  SI: {
    pressure: unit('MPa', '\\mathrm{MPa}', 'MPa'),
    pressure2: unit('MPa²', '\\mathrm{MPa}^{2}', 'MPa^2'),
    pressure3: unit('MPa³', '\\mathrm{MPa}^{3}', 'MPa^3'),
    force: unit('kN', '\\mathrm{kN}', 'kN'),
    length: unit('mm', '\\mathrm{mm}', 'mm'),
    area: unit('mm²', '\\mathrm{mm}^{2}', 'mm^2'),
    volume: unit('mm³', '\\mathrm{mm}^{3}', 'mm^3'),
    moment: unit('N·m', '\\mathrm{N\\,m}', 'N m'),
    forcePerLength: unit('N/mm', '\\mathrm{N/mm}', 'N/mm'),
    angle: unit('°', '^{\\circ}', 'deg'),
    mass: unit('kg', '\\mathrm{kg}', 'kg'),
    time: unit('s', '\\mathrm{s}', 's'),
    density: unit('kg/m³', '\\mathrm{kg/m^{3}}', 'kg/m^3'),
    unitWeight: unit('kN/m³', '\\mathrm{kN/m^{3}}', 'kN/m^3'),
  },
  US: {
    pressure: unit('ksi', '\\mathrm{ksi}', 'ksi'),
    pressure2: unit('ksi²', '\\mathrm{ksi}^{2}', 'ksi^2'),
    pressure3: unit('ksi³', '\\mathrm{ksi}^{3}', 'ksi^3'),
    force: unit('kip', '\\mathrm{kip}', 'kip'),
    length: unit('in', '\\mathrm{in}', 'in'),
    area: unit('in²', '\\mathrm{in}^{2}', 'in^2'),
    volume: unit('in³', '\\mathrm{in}^{3}', 'in^3'),
    moment: unit('kip·in', '\\mathrm{kip\\,in}', 'kip in'),
    forcePerLength: unit('kip/in', '\\mathrm{kip/in}', 'kip/in'),
    angle: unit('°', '^{\\circ}', 'deg'),
    mass: unit('lb', '\\mathrm{lb}', 'lbm'),
    time: unit('s', '\\mathrm{s}', 's'),
    density: unit('lb/in³', '\\mathrm{lb/in^{3}}', 'lbm/in^3'),
    unitWeight: unit('lbf/ft³', '\\mathrm{lbf/ft^{3}}', 'lbf/ft^3'),
  },
};

/** True when `id` is a unit system id. @public */
export function isUnitSystemId(id: string): id is UnitSystemId {
  return (UNIT_SYSTEM_IDS as readonly string[]).includes(id);
}
