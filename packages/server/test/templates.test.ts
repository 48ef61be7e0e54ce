import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createEvaluator } from '@sheaf/engine';
import type { SheetDetail, TemplateDetail, TemplateSummary } from '@sheaf/engine/api';
import { materialsLookupFor } from '../src/services/materials';
import { createTeam, signedInClient, type Team } from './helpers/fixtures';
import { approvedSheet } from './helpers/review';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

const lugSheet = (thickness: string, extra: object[] = []) => ({
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lifting lug, net section',
  unitSystem: 'SI',
  cells: [
    { id: 'n1', kind: 'note', text: 'Net section of a lifting lug in tension (demo).' },
    { id: 'q1', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 'q2', kind: 'quantity', name: 'w', expr: '40 mm' },
    { id: 'q3', kind: 'quantity', name: 't', expr: thickness },
    { id: 's1', kind: 'stress', name: 'S', sx: 'F / (w * t)', sy: '0 MPa', txy: '0 MPa' },
    ...extra,
  ],
});

const parameters = [
  { cellId: 'q1', name: 'F', label: 'Lug load', unit: 'kN', min: '0 kN', max: '200 kN' },
  { cellId: 'q2', name: 'w', label: 'Plate width', unit: 'mm', min: '10 mm' },
  { cellId: 'q3', name: 't', label: 'Plate thickness', unit: 'mm', min: '3 mm', max: 'w / 2' },
];

describe('templates', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;
  let viewer: TestClient;
  let orgBase: string;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'templates');
    engineer = await signedInClient(server, team.users.engineer);
    viewer = await signedInClient(server, team.users.viewer);
    orgBase = `/api/orgs/${team.organizationId}/templates`;
  });
  afterAll(async () => {
    await server?.close();
  });

  async function sheetWith(content: object, title = 'Lug source sheet'): Promise<SheetDetail> {
    const res = await engineer.post(`/api/projects/${team.project.id}/sheets`, { title, content });
    expect(res.status).toBe(201);
    return res.body.sheet;
  }

  it('lists the built-in templates by category and finds them by words', async () => {
    const all = await viewer.get<{ templates: TemplateSummary[]; categories: string[] }>(orgBase);
    expect(all.status).toBe(200);
    expect(all.body.templates.filter((t) => t.builtin).length).toBe(9);
    expect(all.body.categories).toEqual(expect.arrayContaining(['Pressure vessels', 'Shafts', 'Strain gauges', 'Brittle parts', 'Soil and rock', 'Stress at a point']));
    const shafts = await viewer.get<{ templates: TemplateSummary[] }>(`${orgBase}?category=Shafts`);
    expect(shafts.body.templates.map((t) => t.id)).toEqual(['builtin:solid-round-shaft', 'builtin:hollow-round-shaft']);
    const found = await viewer.get<{ templates: TemplateSummary[] }>(`${orgBase}?q=${encodeURIComponent('delta rosette')}`);
    expect(found.body.templates.map((t) => t.id)).toEqual(['builtin:rosette-delta']);
  });

  it('makes a sheet from a built-in template through its parameters; the sheet records the template and evaluates', async () => {
    const res = await engineer.post(`/api/projects/${team.project.id}/sheets/from-template`, {
      templateId: 'builtin:thin-walled-cylinder',
      title: 'Accumulator shell, 25 MPa',
      parameters: { p: '25 MPa', r: '80', t: '8 mm' },
    });
    expect(res.status).toBe(201);
    const sheet: SheetDetail = res.body.sheet;
    expect(sheet.template).toEqual({ id: 'builtin:thin-walled-cylinder', version: 2 });
    expect(res.body.template).toEqual({ id: 'builtin:thin-walled-cylinder', version: 2 });
    const exprs = Object.fromEntries(sheet.content.cells.filter((c) => c.kind === 'quantity').map((c) => [c.name, c.expr]));
    expect(exprs).toMatchObject({ p: '25 MPa', r: '80 mm', t: '8 mm' });
    const ev = createEvaluator(sheet.content as never, { materials: await materialsLookupFor(server.deps.dataSource, team.organizationId) });
    expect([...ev.results.values()].filter((r) => !r.ok)).toEqual([]);
    const hoop = ev.resultByName('s_hoop');
    // Hoop stress pr/t = 25 MPa * 80 / 8 = 250 MPa (common practice, no source).
    expect(hoop?.ok && (hoop.values.value as number) / 1e6).toBeCloseTo(250, 9);

    const fetched = await viewer.get(`/api/sheets/${sheet.id}`);
    expect(fetched.body.sheet.template).toEqual({ id: 'builtin:thin-walled-cylinder', version: 2 });
  });

  it('refuses parameter values out of range, of the wrong dimension or unknown, naming each field, and creates nothing', async () => {
    const before = (await viewer.get(`/api/projects/${team.project.id}/sheets`)).body.sheets.length;
    const res = await engineer.post(`/api/projects/${team.project.id}/sheets/from-template`, {
      templateId: 'builtin:thin-walled-cylinder',
      title: 'Too thick',
      parameters: { p: '25 kN', r: '80 mm', t: '9 mm', q: '1' },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { field: string }) => d.field)).toEqual(['body.parameters.q', 'body.parameters.p', 'body.parameters.t']);
    expect(res.body.error.message).toMatch(/body\.parameters\.p: Internal pressure: expected a stress/);
    expect(res.body.error.message).toMatch(/body\.parameters\.t: Wall thickness must be at most 8 mm \(got 9 mm\)/);
    expect((await viewer.get(`/api/projects/${team.project.id}/sheets`)).body.sheets.length).toBe(before);
  });

  it('keeps a sheet made from version 1 as it was after version 2 is saved, and makes new sheets from either version', async () => {
    const source = await sheetWith(lugSheet('12 mm'));
    const saved = await engineer.post(`/api/sheets/${source.id}/templates`, {
      title: 'Lifting lug net section',
      description: 'Tension on the net section of a plate lug.',
      category: 'Lifting gear',
      parameters,
    });
    expect(saved.body.error ?? null).toBeNull();
    expect(saved.status).toBe(201);
    const v1: TemplateDetail = saved.body.template;
    expect(v1).toMatchObject({ builtin: false, version: 1, title: 'Lifting lug net section', parameterCount: 3 });
    expect(v1.versions.map((v) => v.version)).toEqual([1]);

    const fromV1 = await engineer.post(`/api/projects/${team.project.id}/sheets/from-template`, {
      templateId: v1.id,
      title: 'Lug LG-1',
      parameters: { F: '20 kN', w: '40 mm', t: '10 mm' },
    });
    expect(fromV1.status).toBe(201);
    const sheetV1: SheetDetail = fromV1.body.sheet;
    expect(sheetV1.template).toEqual({ id: v1.id, version: 1 });

    // Version 2: new content (an extra principal cell, 15 mm default) and a tighter load range.
    const source2 = await sheetWith(lugSheet('15 mm', [{ id: 'p1', kind: 'principal', name: 'P', of: 'S' }]), 'Lug source, revised');
    const v2res = await engineer.post(`${orgBase}/${v1.id}/versions`, {
      title: 'Lifting lug net section',
      description: 'Now with principal stresses.',
      category: 'Lifting gear',
      parameters: [{ ...parameters[0], max: '100 kN' }, parameters[1], parameters[2]],
      sheetId: source2.id,
    });
    expect(v2res.status).toBe(201);
    const v2: TemplateDetail = v2res.body.template;
    expect(v2.version).toBe(2);
    expect(v2.versions.map((v) => v.version)).toEqual([2, 1]);

    const kept = await viewer.get(`/api/sheets/${sheetV1.id}`);
    expect(kept.body.sheet.content).toEqual(sheetV1.content);
    expect(kept.body.sheet.template).toEqual({ id: v1.id, version: 1 });
    expect(kept.body.sheet.content.cells.map((c: { id: string }) => c.id)).not.toContain('p1');

    const oldVersion = await viewer.get(`${orgBase}/${v1.id}?version=1`);
    expect(oldVersion.body.template.content.cells.map((c: { id: string }) => c.id)).toEqual(['n1', 'q1', 'q2', 'q3', 's1']);
    expect(oldVersion.body.template.parameters).toEqual(parameters);

    const fromLatest = await engineer.post(`/api/projects/${team.project.id}/sheets/from-template`, {
      templateId: v1.id,
      title: 'Lug LG-2',
      parameters: { F: '20 kN', w: '40 mm', t: '10 mm' },
    });
    expect(fromLatest.body.sheet.template).toEqual({ id: v1.id, version: 2 });
    expect(fromLatest.body.sheet.content.cells.map((c: { id: string }) => c.id)).toContain('p1');

    const fromOld = await engineer.post(`/api/projects/${team.project.id}/sheets/from-template`, {
      templateId: v1.id,
      version: 1,
      title: 'Lug LG-3',
      parameters: { F: '150 kN', w: '40 mm', t: '10 mm' },
    });
    expect(fromOld.status).toBe(201);
    expect(fromOld.body.sheet.template).toEqual({ id: v1.id, version: 1 });
    const tooMuchForV2 = await engineer.post(`/api/projects/${team.project.id}/sheets/from-template`, {
      templateId: v1.id,
      title: 'Lug LG-4',
      parameters: { F: '150 kN', w: '40 mm', t: '10 mm' },
    });
    expect(tooMuchForV2.status).toBe(400);
    expect(tooMuchForV2.body.error.message).toMatch(/body\.parameters\.F: Lug load must be at most 100 kN/);
  });

  it('never changes a stored version: the database refuses the update', async () => {
    const rows: { template_id: string }[] = await server.deps.dataSource.query(`SELECT template_id FROM template_versions LIMIT 1`);
    await expect(
      server.deps.dataSource.query(`UPDATE template_versions SET title = 'changed' WHERE template_id = $1`, [rows[0]?.template_id]),
    ).rejects.toThrow(/never changed/);
  });

  it('refuses parameters that do not fit the sheet, naming the field, and editing a built-in template', async () => {
    const source = await sheetWith(lugSheet('12 mm'));
    const bad = await engineer.post(`/api/sheets/${source.id}/templates`, {
      title: 'Bad lug',
      description: '',
      category: 'Lifting gear',
      parameters: [{ cellId: 's1', name: 'S', label: 'Stress', unit: 'MPa' }, { ...parameters[2], max: '5 mm' }],
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/body\.parameters\[0\]\.cellId: "s1" is not a quantity cell/);
    const builtin = await engineer.post(`${orgBase}/builtin:thin-walled-sphere/versions`, {
      title: 'Mine now',
      description: '',
      category: 'Pressure vessels',
      parameters: [],
    });
    expect(builtin.status).toBe(403);
  });

  it('hides another organization’s template', async () => {
    const other = await createTeam(server.deps.dataSource, 'templates-other');
    const outsider = await signedInClient(server, other.users.engineer);
    const mine = (await viewer.get<{ templates: TemplateSummary[] }>(orgBase)).body.templates.find((t) => !t.builtin);
    expect(mine).toBeDefined();
    const res = await outsider.get(`/api/orgs/${other.organizationId}/templates/${mine!.id}`);
    expect(res.status).toBe(404);
    const make = await outsider.post(`/api/projects/${other.project.id}/sheets/from-template`, { templateId: mine!.id, title: 'x', parameters: {} });
    expect(make.status).toBe(404);
  });

  it('saves an approved revision as a template, naming the revision it came from', async () => {
    const sheetId = await approvedSheet(server.deps.dataSource, team);
    const revision = await viewer.get(`/api/sheets/${sheetId}/revisions/1`);
    expect(revision.status).toBe(200);
    const res = await engineer.post(`/api/sheets/${sheetId}/templates/from-revision/1`, {
      title: 'Lug at the weld toe, approved',
      description: 'From revision 1 as approved.',
      category: 'Lifting gear',
      parameters: [],
    });
    expect(res.status).toBe(201);
    const template: TemplateDetail = res.body.template;
    expect(template.versions[0]).toMatchObject({ version: 1, sourceSheetId: sheetId, sourceRevisionId: expect.any(String) });
    const revisionCells = revision.body.revision.content.cells.map((c: { id: string }) => c.id);
    expect(template.content.cells.map((c) => c.id)).toEqual(revisionCells);
    const missing = await engineer.post(`/api/sheets/${sheetId}/templates/from-revision/9`, { title: 'x', description: '', category: 'y', parameters: [] });
    expect(missing.status).toBe(404);
  });
});
