import type { SheetFileCell, SheetFileContent } from '../../src/collab/sheetDoc';

/** A sheet of realistic size: the lifting-lug example and forty more cells of each common kind. */
export function benchSheet(): SheetFileContent {
  const cells: SheetFileCell[] = [
    { id: 'k1', kind: 'note', text: 'Load case LC2, $F = 18\\,kN$ at 30°' },
    { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 'k3', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
    { id: 'k4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
    { id: 'k5', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
    { id: 'k6', kind: 'principal', name: 'P', of: 'S' },
    { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
  ];
  for (let index = 0; index < 40; index++) {
    cells.push(
      index % 2 === 0
        ? { id: `q${index}`, kind: 'quantity', name: `L${index}`, expr: `${index + 1}.5 mm * 2` }
        : { id: `s${index}`, kind: 'stress', name: `S${index}`, sx: `${index} MPa`, sy: '-4 MPa', txy: 'F / A / 3' },
    );
  }
  return { format: 'sheaf-sheet', version: 1, title: 'Benchmark sheet', unitSystem: 'SI', cells };
}
