import { formatResult, type CellOk, type UnitSystemId } from '@sheaf/engine';

/** One value of a result as the cell shows it: symbol, number and unit. */
export interface ResultRow {
  key: string;
  /** The trade's symbol, e.g. σ with subscript x. */
  symbol: string;
  sub?: string;
  /** What it is, in words (tooltips and screen readers). */
  meaning: string;
  /** The number as printed ("37.5"), or a word ("unbounded", "pass"). */
  number: string;
  /** Display unit ("MPa", "µε", "°", "" for plain numbers). */
  unit: string;
}

type RowSpec = [key: string, symbol: string, sub: string | undefined, meaning: string];

const PLANE: RowSpec[] = [
  ['sx', 'σ', 'x', 'normal stress on the x face'],
  ['sy', 'σ', 'y', 'normal stress on the y face'],
  ['txy', 'τ', 'xy', 'shear stress, +y on the +x face'],
];
const OUT_OF_PLANE: RowSpec[] = [
  ['sz', 'σ', 'z', 'normal stress on the z face'],
  ['tyz', 'τ', 'yz', 'shear stress, +z on the +y face'],
  ['tzx', 'τ', 'zx', 'shear stress, +x on the +z face'],
];

/** The values each kind shows at once; the others are listed under "All values". */
const PRIMARY: Record<string, RowSpec[]> = {
  stress: [...PLANE, ...OUT_OF_PLANE],
  rosette: [
    ['ex', 'ε', 'x', 'normal strain along x'],
    ['ey', 'ε', 'y', 'normal strain along y'],
    ['gxy', 'γ', 'xy', 'engineering shear strain'],
    ['e1', 'ε', '1', 'larger in-plane principal strain'],
    ['e2', 'ε', '2', 'smaller in-plane principal strain'],
    ['thetaE', 'θ', 'ε', 'angle from x to ε1, counterclockwise'],
    ...PLANE,
  ],
  rotate: [
    ['angle', 'θ', undefined, 'rotation of the axes, counterclockwise from x'],
    ['sx', 'σ', "x′", 'normal stress on the rotated x′ face'],
    ['sy', 'σ', "y′", 'normal stress on the rotated y′ face'],
    ['txy', 'τ', "x′y′", 'shear stress on the rotated faces'],
    ...OUT_OF_PLANE,
  ],
  principal: [
    ['p1', 'σ', 'p1', 'larger in-plane principal stress'],
    ['p2', 'σ', 'p2', 'smaller in-plane principal stress'],
    ['thetaP', 'θ', 'p', 'angle from x to σp1, counterclockwise'],
    ['tauMaxInPlane', 'τ', 'max, in-plane', 'largest in-plane shear stress'],
    ['s1', 'σ', '1', 'largest principal stress'],
    ['s2', 'σ', '2', 'middle principal stress'],
    ['s3', 'σ', '3', 'smallest principal stress'],
    ['tauMax', 'τ', 'max', 'absolute maximum shear stress, (σ1 − σ3)/2'],
    ['vonMises', 'σ', 'vM', 'von Mises equivalent stress'],
  ],
  criterion: [
    ['equivalent', 'σ', 'eq', 'equivalent stress of the theory'],
    ['factor', 'n', undefined, 'factor of safety'],
    ['required', 'n', 'req', 'required factor of safety'],
    ['margin', 'MS', undefined, 'margin: n / n_req − 1'],
  ],
  pointset: [
    ['count', 'N', undefined, 'number of stress points'],
    ['minFactor', 'n', 'min', 'smallest factor of safety'],
    ['worstRow', 'row', undefined, 'row with the smallest factor (0-based)'],
    ['failing', 'N', 'fail', 'rows below the required factor'],
    ['required', 'n', 'req', 'required factor of safety'],
  ],
};

/** Words for the other values (shown under "All values"). */
const OTHER: Record<string, [symbol: string, sub: string | undefined, meaning: string]> = {
  thetaS: ['θ', 's', 'angle from x to the maximum-shear face'],
  centerInPlane: ['C', undefined, 'centre of the in-plane circle'],
  tresca: ['σ', 'Tresca', 'Tresca equivalent stress, σ1 − σ3'],
  sigmaOct: ['σ', 'oct', 'octahedral normal stress'],
  tauOct: ['τ', 'oct', 'octahedral shear stress'],
  I1: ['I', '1', 'first stress invariant'],
  I2: ['I', '2', 'second stress invariant'],
  I3: ['I', '3', 'third stress invariant'],
  center12: ['C', '12', 'centre of the σ1–σ2 circle'],
  radius12: ['R', '12', 'radius of the σ1–σ2 circle'],
  center23: ['C', '23', 'centre of the σ2–σ3 circle'],
  radius23: ['R', '23', 'radius of the σ2–σ3 circle'],
  center13: ['C', '13', 'centre of the σ1–σ3 circle'],
  radius13: ['R', '13', 'radius of the σ1–σ3 circle'],
  n1: ['n', '1', 'direction of σ1 (cosines to x, y, z)'],
  n2: ['n', '2', 'direction of σ2 (cosines to x, y, z)'],
  n3: ['n', '3', 'direction of σ3 (cosines to x, y, z)'],
  gammaMaxInPlane: ['γ', 'max', 'largest in-plane engineering shear strain'],
  E: ['E', undefined, "Young's modulus"],
  nu: ['ν', undefined, "Poisson's ratio"],
  s1: ['σ', '1', 'largest principal stress'],
  s2: ['σ', '2', 'middle principal stress'],
  s3: ['σ', '3', 'smallest principal stress'],
  radiusRatio: ['r', undefined, 'Mohr-Coulomb radius ratio'],
  loadFactor: ['n', 'load', 'factor on the load to reach the envelope'],
  planeAngle: ['θ', 'f', 'angle of the critical plane'],
  planeNormal: ['σ', 'f', 'normal stress on the critical plane'],
  planeShear: ['τ', 'f', 'shear stress on the critical plane'],
  factors: ['n', 'i', 'factor of safety of every row'],
};

function rowOf(key: string, spec: [string, string | undefined, string], text: { value: number | null; unit: string; text: string }): ResultRow {
  const [symbol, sub, meaning] = spec;
  const number = text.unit && text.text.endsWith(text.unit) ? text.text.slice(0, -text.unit.length).trim() : text.text;
  return { key, symbol, ...(sub !== undefined ? { sub } : {}), meaning, number, unit: text.unit };
}

/**
 * The values of a result as rows, in the unit system of the sheet: the kind's main values in
 * the order a hand calculation gives them (`primary`), and every other value (`more`). A quantity
 * shows its value under the cell's own name. Out-of-plane stresses of a stress or rotate cell are
 * shown only when one of them is not zero.
 * @example resultRows(result, 'SI', 'S').primary[0] // { key: 'sx', symbol: 'σ', sub: 'x', number: '37.5', unit: 'MPa', ... }
 */
export function resultRows(result: CellOk, system: UnitSystemId, name: string): { primary: ResultRow[]; more: ResultRow[] } {
  const formatted = formatResult(result, system);
  if (result.kind === 'quantity') {
    const value = formatted.value;
    return { primary: value ? [rowOf('value', [name, undefined, `value of ${name}`], value)] : [], more: [] };
  }
  const specs = PRIMARY[result.kind] ?? [];
  const threeD = ['sz', 'tyz', 'tzx'].some((k) => typeof result.values[k] === 'number' && result.values[k] !== 0);
  const shown = new Set<string>();
  const primary: ResultRow[] = [];
  for (const [key, symbol, sub, meaning] of specs) {
    const value = formatted[key];
    if (!value) continue;
    if ((result.kind === 'stress' || result.kind === 'rotate') && ['sz', 'tyz', 'tzx'].includes(key) && !threeD) {
      shown.add(key);
      continue;
    }
    primary.push(rowOf(key, [symbol, sub, meaning], value));
    shown.add(key);
  }
  const more: ResultRow[] = [];
  for (const [key, value] of Object.entries(formatted)) {
    if (shown.has(key) || key === 'pass' || key === 'unbounded') continue;
    const spec = OTHER[key] ?? [key, undefined, key];
    more.push(rowOf(key, spec, value));
  }
  return { primary, more };
}
