/**
 * A material as the evaluator receives it from the organization's materials list. Each value is
 * a number in SI base units (Pa; phi in radians) or an expression with units ("250 MPa",
 * "30 deg"). `source` names the handbook or standard the values come from.
 * @public
 */
export interface Material {
  readonly name?: string;
  readonly Sy?: number | string;
  readonly Sut?: number | string;
  readonly Suc?: number | string;
  readonly c?: number | string;
  readonly phi?: number | string;
  readonly E?: number | string;
  readonly nu?: number | string;
  readonly source: string;
}

/** Materials by id: a Map or a plain object. @public */
export type MaterialsLookup = ReadonlyMap<string, Material> | Readonly<Record<string, Material>>;

/** The material with this id, or undefined. @public */
export function findMaterial(materials: MaterialsLookup | undefined, id: string): Material | undefined {
  if (!materials) return undefined;
  if (materials instanceof Map) return materials.get(id);
  const record = materials as Readonly<Record<string, Material>>;
  return Object.prototype.hasOwnProperty.call(record, id) ? record[id] : undefined;
}
