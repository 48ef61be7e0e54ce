import { createEvaluator, machineOutput, materialsLookupOf } from '@sheaf/engine';
import type { FrozenMaterials, NoteThread, RevisionDetail } from '@sheaf/engine/api';
import { alice, bruno, sheets } from '../../test/fixtures';

/**
 * An issued revision for tests, as the server sends it: a lug at the weld toe (our own numbers)
 * with a note, a load, a stress state, two checks (strength typed in; strength from a frozen
 * material whose yield strength is not confirmed) and a point set; results computed by the
 * engine at "approval" with the frozen materials.
 */
export const FROZEN: FrozenMaterials = {
  'plate-s355': {
    id: 'plate-s355',
    name: 'Plate S355, our stock',
    category: 'carbon-steel',
    notes: '',
    builtin: false,
    updatedAt: '2025-03-01T08:00:00.000Z',
    properties: {
      Sy: { value: '355 MPa', basis: 'minimum', source: 'mill certificate 4471, heat 22, as received', confirmed: false },
    },
  },
};

export const CELLS = [
  { id: 'n1', kind: 'note', text: 'Lug at the weld toe, load case LC2: $P = 18\\,\\mathrm{kN}$ from the sling.' },
  { id: 'q1', kind: 'quantity', name: 'P', expr: '18 kN' },
  { id: 's1', kind: 'stress', name: 'S', sx: 'P / (40 mm * 12 mm)', sy: '0 MPa', txy: '22 MPa' },
  { id: 'c1', kind: 'criterion', name: 'DE', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
  { id: 'c2', kind: 'criterion', name: 'MAT', of: 'S', theory: 'von-mises', material: 'plate-s355', required: '1.5' },
  {
    id: 'p1',
    kind: 'pointset',
    name: 'FE',
    source: { rows: [[80, -40, 25], [120, -35, 42], [60, -10, 12]] },
    columns: { sx: 0, sy: 1, txy: 2 },
    unit: 'MPa',
    theory: 'von-mises',
    strength: { Sy: '355 MPa' },
    required: '1.5',
  },
];

export const SHEET = sheets[0]!;
export const CONTENT_SHA = 'd073186d40cbc4ab9347ce4cf83e1a368cd221265ddc8035c40b691bb80011f4';

export function issuedRevision(overrides: Partial<RevisionDetail> = {}): RevisionDetail {
  const evaluator = createEvaluator({ cells: CELLS }, { materials: materialsLookupOf(Object.values(FROZEN)) });
  return {
    number: 1,
    status: 'approved',
    title: SHEET.title,
    contentSha256: CONTENT_SHA,
    prepared: { user: { id: bruno.id, name: bruno.name }, at: '2025-03-12T10:00:00.000Z' },
    checked: { user: { id: alice.id, name: alice.name }, at: '2025-03-14T09:05:00.000Z' },
    approved: { user: { id: alice.id, name: alice.name }, at: '2025-03-14T09:05:00.000Z' },
    supersededAt: null,
    overrideReason: null,
    openNotesAtApproval: 0,
    content: { format: 'sheaf-sheet', version: 1, title: SHEET.title, unitSystem: 'SI', cells: CELLS },
    results: machineOutput(CELLS, evaluator.results) as RevisionDetail['results'],
    materials: FROZEN,
    ...overrides,
  };
}

/** The checker's note on the material check, answered and resolved. */
export const THREADS: NoteThread[] = [
  {
    id: '99999999-0000-4000-8000-000000000001',
    cellId: 'c2',
    author: { id: alice.id, name: alice.name },
    body: 'Yield strength of the stock plate: attach the certificate.',
    revision: 1,
    createdAt: '2025-03-13T08:00:00.000Z',
    mentions: [],
    status: 'resolved',
    resolvedAt: '2025-03-14T08:30:00.000Z',
    resolvedBy: { id: alice.id, name: alice.name },
    replies: [
      {
        id: '99999999-0000-4000-8000-000000000002',
        cellId: 'c2',
        author: { id: bruno.id, name: bruno.name },
        body: 'Certificate 4471 filed with the job.',
        revision: 1,
        createdAt: '2025-03-13T15:00:00.000Z',
        mentions: [],
      },
    ],
  },
];
