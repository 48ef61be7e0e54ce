import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SheetDetail, SheetSummary } from '@sheaf/engine/api';
import { createProjectIn, createTeam, signedInClient, type Team } from './helpers/fixtures';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

const shaftSheet = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'ignored: the sheet title wins',
  unitSystem: 'SI',
  cells: [
    { id: 'k1', kind: 'quantity', name: 'T', expr: '610 N m' },
    { id: 'k2', kind: 'quantity', name: 'd', expr: '40 mm' },
    { id: 'k3', kind: 'stress', name: 'S', sx: '0 MPa', sy: '0 MPa', txy: '16 * T / (pi * d^3)' },
  ],
};

describe('projects and sheets', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'sheets');
    engineer = await signedInClient(server, team.users.engineer);
  });
  afterAll(async () => {
    await server?.close();
  });

  it('creates projects with a given or derived code, refusing a code already used', async () => {
    const given = await engineer.post(`/api/orgs/${team.organizationId}/projects`, { name: 'Jib crane slew ring', code: 'jcs-2' });
    expect(given.status).toBe(201);
    expect(given.body.project).toMatchObject({ name: 'Jib crane slew ring', code: 'JCS-2', sheetCount: 0 });

    const derived = await engineer.post(`/api/orgs/${team.organizationId}/projects`, { name: 'Hoist drive shaft' });
    expect(derived.body.project.code).toBe('HDS');
    const derivedAgain = await engineer.post(`/api/orgs/${team.organizationId}/projects`, { name: 'Hoist drum shell' });
    expect(derivedAgain.body.project.code).toBe('HDS2');

    const clash = await engineer.post(`/api/orgs/${team.organizationId}/projects`, { name: 'Other', code: 'JCS-2' });
    expect(clash.status).toBe(409);
    expect(clash.body.error.message).toBe('code: project code JCS-2 is already used in this organization');
  });

  it('numbers sheets per project and keeps the content in the file format', async () => {
    const project = await createProjectIn(server.deps.dataSource, team.organizationId, 'SHF');
    const first = await engineer.post(`/api/projects/${project.id}/sheets`, { title: 'Shaft at the keyway' });
    const second = await engineer.post(`/api/projects/${project.id}/sheets`, { title: 'Shaft in torsion', content: shaftSheet });
    expect([first.status, second.status]).toEqual([201, 201]);
    const a = SheetDetail.parse(first.body.sheet);
    const b = SheetDetail.parse(second.body.sheet);
    expect([a.calcNumber, b.calcNumber]).toEqual(['SHF-001', 'SHF-002']);
    expect(a).toMatchObject({ status: 'draft', revision: 0, projectId: project.id, projectName: project.name });
    expect(a.content).toEqual({ format: 'sheaf-sheet', version: 1, title: 'Shaft at the keyway', unitSystem: 'SI', cells: [] });
    expect(b.content).toEqual({ ...shaftSheet, title: 'Shaft in torsion' });

    const fetched = await engineer.get(`/api/sheets/${b.id}`);
    expect(fetched.body).toEqual({ sheet: b, role: 'engineer' });
    const viewer = await signedInClient(server, team.users.viewer);
    expect((await viewer.get(`/api/sheets/${b.id}`)).body.role).toBe('viewer');

    const listed = await engineer.get(`/api/projects/${project.id}/sheets`);
    expect(listed.body.sheets.map((s: SheetSummary) => s.calcNumber)).toEqual(['SHF-002', 'SHF-001']);
    expect(listed.body.sheets[0]).not.toHaveProperty('content');
    const projects = await engineer.get(`/api/orgs/${team.organizationId}/projects`);
    expect(projects.body.projects.find((p: { id: string }) => p.id === project.id).sheetCount).toBe(2);
  });

  it("checks each cell's own fields with the engine's format reader, naming them", async () => {
    const refused = await engineer.post(`/api/projects/${team.project.id}/sheets`, {
      title: 'Bracket stress',
      content: { format: 'sheaf-sheet', version: 1, cells: [{ id: 'k1', kind: 'stress', name: 'S', sx: 12, sy: '0 MPa' }] },
    });
    expect(refused.status).toBe(400);
    expect(refused.body.error).toEqual({
      code: 'invalid-field',
      message:
        'content.cells[0].sx: must be a string (an expression such as "120 MPa"); ' +
        'content.cells[0].txy: must be a string (an expression such as "120 MPa")',
    });
  });

  it('gives every sheet its own calc number when many are created at once', async () => {
    const project = await createProjectIn(server.deps.dataSource, team.organizationId, 'PAR');
    const made = await Promise.all(
      Array.from({ length: 8 }, (_, i) => engineer.post(`/api/projects/${project.id}/sheets`, { title: `Pad bearing ${i}` })),
    );
    const numbers = made.map((r) => r.body.sheet.calcNumber as string).sort();
    expect(numbers).toEqual(Array.from({ length: 8 }, (_, i) => `PAR-00${i + 1}`));
  });

  it('searches titles and calc numbers, and filters by status', async () => {
    const project = await createProjectIn(server.deps.dataSource, team.organizationId, 'SRC');
    await engineer.post(`/api/projects/${project.id}/sheets`, { title: 'Accumulator shell hoop stress' });
    await engineer.post(`/api/projects/${project.id}/sheets`, { title: 'Accumulator end cap' });
    await engineer.post(`/api/projects/${project.id}/sheets`, { title: 'Pulley hub bore' });
    await server.deps.dataSource.query(`UPDATE sheets SET status = 'approved' WHERE calc_number = 'SRC-002' AND organization_id = $1`, [
      team.organizationId,
    ]);

    const search = async (query: string) =>
      ((await engineer.get(`/api/orgs/${team.organizationId}/sheets?${query}`)).body.sheets as SheetSummary[]).map((s) => s.calcNumber).sort();
    expect(await search('q=accumulator')).toEqual(['SRC-001', 'SRC-002']);
    expect(await search('q=ACCUMULATOR+hoop')).toEqual(['SRC-001']);
    expect(await search('q=src-003')).toEqual(['SRC-003']);
    expect(await search('q=accumulator&status=approved')).toEqual(['SRC-002']);
    expect(await search('q=%25')).toEqual([]);
    const everything = await search('');
    expect(everything.length).toBeGreaterThanOrEqual(3);
  });

  it('renames a sheet (and its content title) and moves it within the organization only', async () => {
    const project = await createProjectIn(server.deps.dataSource, team.organizationId, 'MOV');
    const target = await createProjectIn(server.deps.dataSource, team.organizationId, 'DST');
    const made = (await engineer.post(`/api/projects/${project.id}/sheets`, { title: 'Lug weld', content: shaftSheet })).body.sheet;

    const renamed = await engineer.patch(`/api/sheets/${made.id}`, { title: 'Lug weld, LC3' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.sheet.title).toBe('Lug weld, LC3');
    expect(renamed.body.sheet.content.title).toBe('Lug weld, LC3');
    expect(renamed.body.sheet.content.cells).toEqual(shaftSheet.cells);
    expect(Date.parse(renamed.body.sheet.updatedAt)).toBeGreaterThanOrEqual(Date.parse(made.updatedAt));

    const moved = await engineer.patch(`/api/sheets/${made.id}`, { projectId: target.id });
    expect(moved.body.sheet).toMatchObject({ projectId: target.id, projectName: target.name, calcNumber: 'MOV-001' });

    const elsewhere = await createTeam(server.deps.dataSource, 'other-org');
    const refused = await engineer.patch(`/api/sheets/${made.id}`, { projectId: elsewhere.project.id });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toBe("projectId: no project with this id in the sheet's organization");

    expect((await engineer.delete(`/api/sheets/${made.id}`)).status).toBe(204);
    expect((await engineer.get(`/api/sheets/${made.id}`)).status).toBe(404);
  });
});
