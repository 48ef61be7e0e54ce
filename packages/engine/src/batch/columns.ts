/**
 * Columns of stress components, one Float64Array per component, all of the same length, in Pa.
 * Without `sz`, `tyz` and `tzx` the rows are plane states.
 * @public
 */
export interface StressColumns {
  readonly sx: Float64Array;
  readonly sy: Float64Array;
  readonly txy: Float64Array;
  readonly sz?: Float64Array;
  readonly tyz?: Float64Array;
  readonly tzx?: Float64Array;
}

/** Output columns of the three sorted principal stresses, Pa. @public */
export interface PrincipalColumns {
  readonly s1: Float64Array;
  readonly s2: Float64Array;
  readonly s3: Float64Array;
}

/** Number of rows, after checking that every given column has it. Throws on a programmer error. @public */
export function rowCount(columns: StressColumns): number {
  const n = columns.sx.length;
  for (const [key, col] of Object.entries(columns)) {
    if (col !== undefined && (col as Float64Array).length !== n) {
      throw new Error(`column ${key} has ${(col as Float64Array).length} rows, sx has ${n}`);
    }
  }
  const three = [columns.sz, columns.tyz, columns.tzx].filter((c) => c !== undefined).length;
  if (three !== 0 && three !== 3) throw new Error('give all of sz, tyz, tzx or none');
  return n;
}

/** Allocate principal output columns of `n` rows. @public */
export function allocatePrincipal(n: number): PrincipalColumns {
  return { s1: new Float64Array(n), s2: new Float64Array(n), s3: new Float64Array(n) };
}
