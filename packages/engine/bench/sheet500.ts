import type { CellInput } from '../src/sheet/createEvaluator';

/**
 * A generated 500-cell sheet in the style of a real one: a shared yield strength, then 166
 * groups of load → stress → criterion (every second group with a principal cell instead of a
 * second criterion), each group reading the shared strength.
 */
export function generatedSheet(): CellInput[] {
  const cells: CellInput[] = [{ id: 'sy', kind: 'quantity', name: 'Sy', expr: '250 MPa' }, { id: 'a', kind: 'quantity', name: 'A0', expr: '40 mm * 12 mm' }];
  for (let i = 0; cells.length < 500; i++) {
    cells.push({ id: `f${i}`, kind: 'quantity', name: `F${i}`, expr: `${10 + (i % 17)} kN` });
    cells.push({ id: `s${i}`, kind: 'stress', name: `S${i}`, sx: `F${i} / A0`, sy: `${i % 5} MPa`, txy: `${5 + (i % 11)} MPa` });
    cells.push(
      i % 2 === 0
        ? { id: `p${i}`, kind: 'principal', name: `P${i}`, of: `S${i}` }
        : { id: `c${i}`, kind: 'criterion', name: `C${i}`, of: `S${i}`, theory: 'von-mises', strength: { Sy: 'Sy' }, required: '1.5' },
    );
  }
  return cells.slice(0, 500);
}
