/** Seeded random stress points for the benchmarks (the same points on every run). */

/** mulberry32: a small seeded generator, enough for benchmark data. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Six columns of n random components in Pa, each in ±300 MPa, in SharedArrayBuffers for workers. */
export function randomColumns(n: number, seed = 12345): Record<'sx' | 'sy' | 'sz' | 'txy' | 'tyz' | 'tzx', Float64Array> {
  const random = seededRandom(seed);
  const column = () => {
    const a = new Float64Array(new SharedArrayBuffer(n * 8));
    for (let i = 0; i < n; i++) a[i] = (random() * 2 - 1) * 300e6;
    return a;
  };
  return { sx: column(), sy: column(), sz: column(), txy: column(), tyz: column(), tzx: column() };
}
