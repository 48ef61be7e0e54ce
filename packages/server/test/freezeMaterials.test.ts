import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createEvaluator, machineOutput } from '@sheaf/engine';
import { evaluateWithFrozenMaterials, freezeMaterials, materialIdsOf } from '../src/services/freezeMaterials';
import { materialsLookupFor } from '../src/services/materials';
import { approveSheet } from '../src/services/review/approveSheet';
import { submitForCheck } from '../src/services/review/workflowTransitions';
import { createSheet } from '../src/services/sheets';
import { createTeam, signedInClient, type Team } from './helpers/fixtures';
import type { TestClient } from './helpers/TestClient';
import type { RevisionDetail } from '@sheaf/engine/api';
import { startTestServer, type TestServer } from './helpers/testServer';

const hubIron = (sut: string) => ({
  name: 'Pulley hub iron (demo)',
  category: 'cast-iron',
  notes: 'Invented values for tests.',
  properties: {
    Sut: { value: sut, basis: 'typical', source: 'Demo foundry test bars, invented' },
    Suc: { value: '760 MPa', basis: 'typical', source: 'Demo foundry test bars, invented' },
  },
});

const content = {
  format: 'sheaf-sheet' as const,
  version: 1 as const,
  title: 'Pulley hub, bore edge',
  cells: [
    { id: 's1', kind: 'stress', name: 'S', sx: '-30 MPa', sy: '55 MPa', txy: '20 MPa' },
    { id: 'c1', kind: 'criterion', name: 'BCM', of: 'S', theory: 'coulomb-mohr', material: 'hub-iron-demo', required: '2' },
    { id: 'c2', kind: 'criterion', name: 'DE', of: 'S', theory: 'von-mises', material: 'astm-a36' },
    { id: 'c3', kind: 'criterion', name: 'MM', of: 'S', theory: 'modified-mohr', material: 'hub-iron-demo' },
    { id: 'c4', kind: 'criterion', name: 'Gone', of: 'S', theory: 'von-mises', material: 'no-such-material' },
  ],
};

describe('frozen material values of a revision', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'freeze');
    engineer = await signedInClient(server, team.users.engineer);
    const made = await engineer.post(`/api/orgs/${team.organizationId}/materials`, { id: 'hub-iron-demo', ...hubIron('210 MPa') });
    expect(made.status).toBe(201);
  });
  afterAll(async () => {
    await server?.close();
  });

  it('names each material a sheet uses once', () => {
    expect(materialIdsOf(content)).toEqual(['hub-iron-demo', 'astm-a36', 'no-such-material']);
  });

  it('freezes values with basis and source, leaving out ids the library does not hold', async () => {
    const frozen = await freezeMaterials(server.deps.dataSource, content, team.organizationId);
    expect(Object.keys(frozen).sort()).toEqual(['astm-a36', 'hub-iron-demo']);
    expect(frozen['hub-iron-demo']?.properties.Sut).toEqual({ value: '210 MPa', basis: 'typical', source: 'Demo foundry test bars, invented' });
    expect(frozen['astm-a36']?.properties.Sy?.basis).toBe('minimum');
    expect(frozen['astm-a36']?.builtin).toBe(true);
  });

  it('a revision’s frozen material values survive an edit of the library', async () => {
    const frozen = await freezeMaterials(server.deps.dataSource, content, team.organizationId);
    // As stored with a revision: through JSON and back.
    const stored = JSON.parse(JSON.stringify(frozen));
    const atIssue = evaluateWithFrozenMaterials(content, stored);
    expect(atIssue.cells.BCM?.values?.factor).toEqual(expect.any(Number));
    expect(atIssue.cells.Gone?.error?.code).toBe('unknown-material');

    const edit = await engineer.request('PUT', `/api/orgs/${team.organizationId}/materials/hub-iron-demo`, { body: hubIron('150 MPa') });
    expect(edit.status).toBe(200);

    const later = evaluateWithFrozenMaterials(content, stored);
    expect(later).toEqual(atIssue);

    // The live library has moved on: evaluating with it gives other numbers.
    const live = createEvaluator(content, { materials: await materialsLookupFor(server.deps.dataSource, team.organizationId) });
    const liveOutput = machineOutput(live.cells, live.results);
    expect(liveOutput.cells.BCM?.values?.factor).not.toBeCloseTo(atIssue.cells.BCM?.values?.factor as number, 3);
    // Brittle Coulomb-Mohr in the fourth quadrant: 1/n = sA/Sut - sB/Suc (Shigley 9th ed., eq. 5-31, from memory).
    const centre = (-30 + 55) / 2;
    const radius = Math.hypot((-30 - 55) / 2, 20);
    const [sA, sB] = [centre + radius, centre - radius];
    expect(atIssue.cells.BCM?.values?.factor).toBeCloseTo(1 / (sA / 210 - sB / 760), 9);
    expect(liveOutput.cells.BCM?.values?.factor).toBeCloseTo(1 / (sA / 150 - sB / 760), 9);
  });

  it('an approved revision keeps its frozen material values and results after the library is edited', async () => {
    const made = await engineer.post(`/api/orgs/${team.organizationId}/materials`, { id: 'hub-iron-rev', ...hubIron('220 MPa') });
    expect(made.status).toBe(201);
    const revisionContent = {
      ...content,
      cells: [
        ...content.cells.filter((c) => c.id !== 'c4').map((c) => (c.material === 'hub-iron-demo' ? { ...c, material: 'hub-iron-rev' } : c)),
        // A built-in material whose values are marked as not confirmed against their source.
        { id: 'c5', kind: 'criterion', name: 'pinYield', of: 'S', theory: 'von-mises', material: 'ss-17-4ph-h1025' },
      ],
    };
    const sheet = await createSheet(server.deps.dataSource, team.project, { title: 'Pulley hub, issued', content: revisionContent, createdByUserId: team.users.engineer.id });
    await submitForCheck(server.deps.dataSource, undefined, sheet.id, { userId: team.users.engineer.id }, { checkerUserId: team.users.checker.id });
    await approveSheet(server.deps.dataSource, undefined, sheet.id, { userId: team.users.checker.id }, {});

    const viewer = await signedInClient(server, team.users.viewer);
    const issued: RevisionDetail = (await viewer.get(`/api/sheets/${sheet.id}/revisions/1`)).body.revision;
    expect(issued.materials?.['hub-iron-rev']?.properties.Sut?.value).toBe('220 MPa');
    expect(issued.materials?.['hub-iron-rev']?.properties.Sut?.source).toBe('Demo foundry test bars, invented');
    expect(Object.keys(issued.materials ?? {}).sort()).toEqual(['astm-a36', 'hub-iron-rev', 'ss-17-4ph-h1025']);
    // The frozen copy keeps the mark of values that could not be confirmed, for the revision's report.
    expect(issued.materials?.['ss-17-4ph-h1025']?.properties.Sy).toMatchObject({ value: '1000 MPa', basis: 'minimum', confirmed: false });
    expect(issued.materials?.['astm-a36']?.properties.Sy?.confirmed).toBe(true);
    const factorAtIssue = issued.results.cells.BCM?.values?.factor as number;
    // Brittle Coulomb-Mohr with Sut = 220 MPa, Suc = 760 MPa (Shigley 9th ed., eq. 5-31, from memory).
    const centre = (-30 + 55) / 2;
    const radius = Math.hypot((-30 - 55) / 2, 20);
    expect(factorAtIssue).toBeCloseTo(1 / ((centre + radius) / 220 - (centre - radius) / 760), 9);

    const edit = await engineer.request('PUT', `/api/orgs/${team.organizationId}/materials/hub-iron-rev`, { body: hubIron('120 MPa') });
    expect(edit.status).toBe(200);

    const later: RevisionDetail = (await viewer.get(`/api/sheets/${sheet.id}/revisions/1`)).body.revision;
    expect(later.results).toEqual(issued.results);
    expect(later.materials).toEqual(issued.materials);
    // Evaluating the stored content again with its frozen values gives the stored results.
    expect(evaluateWithFrozenMaterials(later.content, later.materials ?? {})).toEqual(later.results);
    // The sheet as it is now uses the edited library: the diff against revision 1 shows the factor moved.
    const diff = await viewer.get(`/api/sheets/${sheet.id}/diff?from=1&to=current`);
    expect(diff.status).toBe(200);
    const moved = (diff.body.diff.results as { cellName: string; key: string | null; old: { si: number | null } | null; new: { si: number | null } | null }[])
      .filter((r) => r.cellName === 'BCM' && r.key === 'factor');
    expect(moved).toHaveLength(1);
    expect(moved[0]!.old?.si).toBeCloseTo(factorAtIssue, 6);
    expect(moved[0]!.new?.si).toBeCloseTo(1 / ((centre + radius) / 120 - (centre - radius) / 760), 6);
    // No input of the sheet changed: only the library did.
    expect(diff.body.diff.changed).toEqual([]);
  });
});
