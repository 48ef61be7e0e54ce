/**
 * Stress and strain states as plain numbers.
 *
 * Units: stresses in Pa, angles in radians, strains dimensionless (SI base units, as everywhere
 * inside the engine). Sign convention: tension positive; `txy` positive when it acts in +y on the
 * +x face (and in +x on the +y face); angles counterclockwise from x.
 */

/** A plane stress state in Pa. @public */
export interface PlaneStress {
  readonly sx: number;
  readonly sy: number;
  readonly txy: number;
}

/** A general symmetric stress tensor in Pa (`tzx` is the shear on the z face in x). @public */
export interface StressTensor extends PlaneStress {
  readonly sz: number;
  readonly tyz: number;
  readonly tzx: number;
}

/** A plane strain state: normal strains and the engineering shear strain `gxy` (= 2 exy). @public */
export interface PlaneStrain {
  readonly ex: number;
  readonly ey: number;
  /** Engineering shear strain, positive when the right angle between +x and +y decreases. */
  readonly gxy: number;
}

/** A unit vector or point in 3D. @public */
export type Vector3 = readonly [number, number, number];

/** Principal values sorted largest first: `[s1, s2, s3]` with s1 >= s2 >= s3. @public */
export type PrincipalTriple = readonly [number, number, number];

/**
 * Lift a plane state to a tensor with zero out-of-plane components.
 * @example toTensor({ sx: 1e6, sy: 0, txy: 2e6 }) // { sx: 1e6, sy: 0, txy: 2e6, sz: 0, tyz: 0, tzx: 0 }
 * @public
 */
export function toTensor(state: PlaneStress | StressTensor): StressTensor {
  const t = state as Partial<StressTensor>;
  return {
    sx: state.sx,
    sy: state.sy,
    txy: state.txy,
    sz: t.sz ?? 0,
    tyz: t.tyz ?? 0,
    tzx: t.tzx ?? 0,
  };
}

/**
 * True when the tensor is a plane stress state in x-y (sz, tyz and tzx all zero).
 * @public
 */
export function isPlaneState(t: StressTensor): boolean {
  return t.sz === 0 && t.tyz === 0 && t.tzx === 0;
}

/**
 * True when z is a principal direction (tyz = tzx = 0): the in-plane pair p1, p2 and the angle
 * thetaP are then meaningful even when sz is not zero.
 * @public
 */
export function hasPrincipalZ(t: StressTensor): boolean {
  return t.tyz === 0 && t.tzx === 0;
}
