import type { SheetContentV1 } from '@sheaf/engine/api';

/** A demo project of the invented firm; `keywords` route example files to it by name. */
export interface DemoProject {
  code: string;
  name: string;
  keywords: string[];
}

export const DEMO_PROJECTS: readonly DemoProject[] = [
  { code: 'GBL', name: 'Gantry beam lifting lug', keywords: ['lug', 'gantry', 'weld'] },
  { code: 'HDS', name: 'Hoist drive shaft', keywords: ['shaft', 'hoist', 'torsion', 'keyway'] },
  { code: 'HAS', name: 'Hydraulic accumulator shell', keywords: ['accumulator', 'shell', 'vessel', 'hoop', 'pressure'] },
  { code: 'BLT', name: 'Bracket load test', keywords: ['bracket', 'gauge', 'rosette', 'strain', 'test'] },
  { code: 'PHB', name: 'Cast-iron pulley hub', keywords: ['pulley', 'hub', 'cast', 'iron', 'brittle'] },
  { code: 'FPD', name: 'Foundation pad', keywords: ['soil', 'pad', 'foundation', 'footing', 'bearing'] },
];

const CAUTION =
  'Demo calculation for Northgate Lifting Ltd. (an invented firm; all numbers are ours). Results support, ' +
  'not replace, the judgement of a qualified engineer: verify them against the governing codes. Approval ' +
  'rests with licensed practice.';

/** A sheet the seed writes when no example files are found; `key` keeps it from being written twice. */
export interface DemoSheet {
  key: string;
  projectCode: string;
  content: SheetContentV1;
}

function sheet(title: string, cells: SheetContentV1['cells']): SheetContentV1 {
  return { format: 'sheaf-sheet', version: 1, title, unitSystem: 'SI', cells: [{ id: 'c0', kind: 'note', text: CAUTION }, ...cells] };
}

/** One small sheet per demo project, in the sheet file format version 1. */
export const BUILT_IN_DEMO_SHEETS: readonly DemoSheet[] = [
  {
    key: 'built-in/lifting-lug',
    projectCode: 'GBL',
    content: sheet('Lifting lug, weld toe under LC2', [
      { id: 'c1', kind: 'note', text: 'Load case LC2: sling at 30° from vertical, $F = 18\\,kN$ on one lug.' },
      { id: 'c2', kind: 'quantity', name: 'F', expr: '18 kN' },
      { id: 'c3', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
      { id: 'c4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
      { id: 'c5', kind: 'principal', name: 'P', of: 'S' },
      { id: 'c6', kind: 'criterion', name: 'vonMises', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ]),
  },
  {
    key: 'built-in/hoist-shaft',
    projectCode: 'HDS',
    content: sheet('Drive shaft at the keyway, bending with torsion', [
      { id: 'c1', kind: 'quantity', name: 'M', expr: '420 N m' },
      { id: 'c2', kind: 'quantity', name: 'T', expr: '610 N m' },
      { id: 'c3', kind: 'quantity', name: 'd', expr: '40 mm' },
      { id: 'c4', kind: 'stress', name: 'S', sx: '32 * M / (pi * d^3)', sy: '0 MPa', txy: '16 * T / (pi * d^3)' },
      { id: 'c5', kind: 'principal', name: 'P', of: 'S' },
      { id: 'c6', kind: 'criterion', name: 'tresca', of: 'S', theory: 'tresca', strength: { Sy: '350 MPa' }, required: '2' },
    ]),
  },
  {
    key: 'built-in/accumulator-shell',
    projectCode: 'HAS',
    content: sheet('Accumulator shell, membrane stresses at working pressure', [
      { id: 'c1', kind: 'quantity', name: 'p', expr: '21 MPa' },
      { id: 'c2', kind: 'quantity', name: 'r', expr: '80 mm' },
      { id: 'c3', kind: 'quantity', name: 't', expr: '8 mm' },
      { id: 'c4', kind: 'stress', name: 'S', sx: 'p * r / (2 * t)', sy: 'p * r / t', txy: '0 MPa' },
      { id: 'c5', kind: 'principal', name: 'P', of: 'S' },
      { id: 'c6', kind: 'criterion', name: 'vonMises', of: 'S', theory: 'von-mises', strength: { Sy: '355 MPa' }, required: '1.5' },
    ]),
  },
  {
    key: 'built-in/bracket-rosette',
    projectCode: 'BLT',
    content: sheet('Bracket gauge R1 at 3 kN proof load', [
      {
        id: 'c1',
        kind: 'rosette',
        name: 'R1',
        layout: 'rectangular',
        ea: '420e-6',
        eb: '150e-6',
        ec: '-80e-6',
        E: '200 GPa',
        nu: '0.29',
      },
      { id: 'c2', kind: 'principal', name: 'P', of: 'R1' },
      { id: 'c3', kind: 'criterion', name: 'vonMises', of: 'R1', theory: 'von-mises', strength: { Sy: '275 MPa' }, required: '1.5' },
    ]),
  },
  {
    key: 'built-in/pulley-hub',
    projectCode: 'PHB',
    content: sheet('Pulley hub, cast iron, bore edge', [
      { id: 'c1', kind: 'stress', name: 'S', sx: '60 MPa', sy: '-90 MPa', txy: '25 MPa' },
      { id: 'c2', kind: 'principal', name: 'P', of: 'S' },
      {
        id: 'c3',
        kind: 'criterion',
        name: 'modifiedMohr',
        of: 'S',
        theory: 'modified-mohr',
        strength: { Sut: '210 MPa', Suc: '750 MPa' },
        required: '2',
      },
    ]),
  },
  {
    key: 'built-in/foundation-pad',
    projectCode: 'FPD',
    content: sheet('Soil below the pad edge, Mohr-Coulomb check', [
      {
        id: 'c1',
        kind: 'note',
        text: 'Elastic estimate 1.2 m below the pad edge: bearing pressure from the hoist frame plus overburden. Compression negative.',
      },
      { id: 'c2', kind: 'stress', name: 'S', sx: '-70 kPa', sy: '-150 kPa', txy: '18 kPa', sz: '-80 kPa', tyz: '0 kPa', tzx: '0 kPa' },
      { id: 'c3', kind: 'principal', name: 'P', of: 'S' },
      {
        id: 'c4',
        kind: 'criterion',
        name: 'mohrCoulomb',
        of: 'S',
        theory: 'mohr-coulomb',
        strength: { c: '12 kPa', phi: '30 deg' },
        required: '1.3',
      },
    ]),
  },
];

/** The demo project an example file belongs to, by words in its file name and title. */
export function projectForExample(fileName: string, title: string): DemoProject {
  // The file name is the more deliberate label, so it decides before the title does.
  const byName = (text: string) => DEMO_PROJECTS.find((p) => p.keywords.some((k) => text.toLowerCase().includes(k)));
  return byName(fileName) ?? byName(title) ?? (DEMO_PROJECTS[0] as DemoProject);
}
