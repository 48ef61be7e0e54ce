import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { parseMaterialsCsv } from '../src/services/materialsCsv';
import { createTeam, signedInClient, type Team } from './helpers/fixtures';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

const HEADER =
  'id,name,category,notes,Sy,Sy_basis,Sy_source,Sut,Sut_basis,Sut_source,Suc,Suc_basis,Suc_source,c,c_basis,c_source,phi,phi_basis,phi_source,E,E_basis,E_source,nu,nu_basis,nu_source';

const lugPlate = {
  id: 'lug-plate-demo',
  name: 'Lug plate, demo mill certificate',
  category: 'carbon-steel',
  notes: 'Invented values for tests.',
  properties: {
    Sy: { value: '355 MPa', basis: 'minimum', source: 'Demo mill certificate 4711, invented' },
    Sut: { value: '490 MPa', basis: 'minimum', source: 'Demo mill certificate 4711, invented' },
  },
};

describe('materials library', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;
  let viewer: TestClient;
  let base: string;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'materials');
    engineer = await signedInClient(server, team.users.engineer);
    viewer = await signedInClient(server, team.users.viewer);
    base = `/api/orgs/${team.organizationId}/materials`;
  });
  afterAll(async () => {
    await server?.close();
  });

  it('lists the built-in materials with a basis and a source for every value', async () => {
    const res = await viewer.get<{ materials: LibraryMaterial[] }>(base);
    expect(res.status).toBe(200);
    const builtins = res.body.materials.filter((m) => m.builtin);
    expect(builtins.length).toBeGreaterThanOrEqual(15);
    const a36 = builtins.find((m) => m.id === 'astm-a36');
    expect(a36?.properties.Sy).toEqual({ value: '250 MPa', basis: 'minimum', source: expect.stringMatching(/ASTM A36\/A36M-19, Table 3/), confirmed: true });
    for (const m of builtins) {
      for (const v of Object.values(m.properties)) {
        expect(v?.source.length).toBeGreaterThan(10);
        expect(typeof v?.confirmed, m.id).toBe('boolean');
      }
    }
    // A value that could not be confirmed against its source says so, for the picker and the sheet to show.
    expect(builtins.find((m) => m.id === 'ss-17-4ph-h1025')?.properties.Sy?.confirmed).toBe(false);
  });

  it('lets an engineer add and edit the organization’s own material, and refuses to edit a built-in', async () => {
    const made = await engineer.post(base, lugPlate);
    expect(made.status).toBe(201);
    expect(made.body.material).toMatchObject({ id: 'lug-plate-demo', builtin: false });

    const again = await engineer.post(base, lugPlate);
    expect(again.status).toBe(409);

    const edited = await engineer.request('PUT', `${base}/lug-plate-demo`, {
      body: { ...lugPlate, id: undefined, properties: { ...lugPlate.properties, Sy: { value: '345 MPa', basis: 'minimum', source: 'Demo certificate 4712, invented' } } },
    });
    expect(edited.status).toBe(200);
    expect(edited.body.material.properties.Sy.value).toBe('345 MPa');

    const builtin = await engineer.request('PUT', `${base}/astm-a36`, { body: { ...lugPlate, id: undefined } });
    expect(builtin.status).toBe(403);
    expect(builtin.body.error.message).toMatch(/built-in/);

    const taken = await engineer.post(base, { ...lugPlate, id: 'astm-a36' });
    expect(taken.status).toBe(400);
    expect(taken.body.error.message).toMatch(/^body\.id: "astm-a36" is a built-in material/);
  });

  it('names the field of a value with the wrong dimension or without a source, and saves nothing', async () => {
    const wrongUnit = await engineer.post(base, {
      ...lugPlate,
      id: 'wrong-unit',
      properties: { Sy: { value: '355 kN', basis: 'minimum', source: 'Demo, invented' } },
    });
    expect(wrongUnit.status).toBe(400);
    expect(wrongUnit.body.error.message).toMatch(/^body\.properties\.Sy\.value: expected a stress/);
    const noSource = await engineer.post(base, {
      ...lugPlate,
      id: 'no-source',
      properties: { Sy: { value: '355 MPa', basis: 'minimum', source: '' } },
    });
    expect(noSource.status).toBe(400);
    expect(noSource.body.error.message).toMatch(/properties\.Sy\.source: must name the published source/);
    const list = await viewer.get<{ materials: LibraryMaterial[] }>(base);
    expect(list.body.materials.map((m) => m.id)).not.toContain('wrong-unit');
    expect(list.body.materials.map((m) => m.id)).not.toContain('no-source');
  });

  it('imports CSV with a bad row as nothing at all, naming each bad row, column and problem', async () => {
    const before = (await viewer.get<{ materials: LibraryMaterial[] }>(base)).body.materials.length;
    const csv = [
      HEADER,
      'hub-iron-demo,Pulley hub iron (demo),cast-iron,,,,,210 MPa,typical,Demo foundry test bars,760 MPa,typical,Demo foundry test bars,,,,,,,,,,,,',
      'bad-unit-demo,Bad unit,carbon-steel,,300 kN,minimum,Demo,,,,,,,,,,,,,,,,,,',
      'no-source-demo,No source,carbon-steel,,300 MPa,minimum,,,,,,,,,,,,,,,,,,,',
      'astm-a36,Shadowing a built-in,carbon-steel,,300 MPa,minimum,Demo source,,,,,,,,,,,,,,,,,,',
      'Bad Id,Bad id,rubber,,300 MPa,guess,Demo source,,,,,,,,,,,,,,,,,,',
    ].join('\n');
    const res = await engineer.post(`${base}/import`, { csv });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-field');
    expect(res.body.error.message).toMatch(/nothing was saved/);
    const details = res.body.error.details as { row: number; column: string; message: string }[];
    expect(details.map((d) => [d.row, d.column])).toEqual([
      [3, 'Sy'],
      [4, 'Sy_source'],
      [5, 'id'],
      [6, 'id'],
      [6, 'category'],
      [6, 'Sy_basis'],
    ]);
    expect(details[0]!.message).toMatch(/^row 3, Sy: expected a stress .* got a force/);
    const after = (await viewer.get<{ materials: LibraryMaterial[] }>(base)).body.materials;
    expect(after.length).toBe(before);
    expect(after.map((m) => m.id)).not.toContain('hub-iron-demo');
  });

  it('imports good CSV (adding and replacing) and exports it back', async () => {
    const csv = [
      HEADER,
      'hub-iron-demo,Pulley hub iron (demo),cast-iron,Invented,,,,210 MPa,typical,Demo foundry test bars,760 MPa,typical,Demo foundry test bars,,,,,,,100 GPa,typical,Demo,0.21,typical,Demo',
      'lug-plate-demo,"Lug plate, re-certified",carbon-steel,,350 MPa,minimum,"Demo certificate 4713, invented",490 MPa,minimum,"Demo certificate 4713, invented",,,,,,,,,,,,,,,',
    ].join('\r\n');
    const res = await engineer.post(`${base}/import`, { csv });
    expect(res.status).toBe(200);
    expect([res.body.created, res.body.updated]).toEqual([1, 1]);

    const exported = await viewer.get(`${base}/export`);
    expect(exported.status).toBe(200);
    expect(exported.body.count).toBe(2);
    const back = parseMaterialsCsv(exported.body.csv);
    expect(back.problems).toEqual([]);
    expect(back.records.map((r) => [r.id, r.name, r.properties.Sy?.value ?? null, r.properties.Suc?.value ?? null])).toEqual([
      ['hub-iron-demo', 'Pulley hub iron (demo)', null, '760 MPa'],
      ['lug-plate-demo', 'Lug plate, re-certified', '350 MPa', null],
    ]);
  });

  it('lets an engineer delete the organization’s own material but not a built-in', async () => {
    expect((await engineer.request('DELETE', `${base}/hub-iron-demo`)).status).toBe(204);
    expect((await engineer.request('DELETE', `${base}/hub-iron-demo`)).status).toBe(404);
    expect((await engineer.request('DELETE', `${base}/astm-a36`)).status).toBe(403);
  });
});
