import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { createMaterial } from '../../src/services/materials';
import { createTemplate } from '../../src/services/templates';
import type { Team } from './fixtures';

/** A material id no other test uses. */
export function uniqueMaterialKey(label = 'matrix'): string {
  return `${label}-${randomUUID().slice(0, 8)}`;
}

/** A small organization material (invented values) as the API takes it, without its id. */
export function demoMaterialBody(name = 'Matrix plate steel (demo)') {
  return {
    name,
    category: 'carbon-steel' as const,
    notes: '',
    properties: { Sy: { value: '300 MPa', basis: 'minimum' as const, source: 'Demo certificate, invented' } },
  };
}

/** An organization material written through the service; returns its key. */
export async function insertDemoMaterial(dataSource: DataSource, team: Team): Promise<string> {
  const key = uniqueMaterialKey();
  await createMaterial(dataSource, team.organizationId, { id: key, ...demoMaterialBody() }, team.users.owner.id);
  return key;
}

/** An organization template (version 1) made from a one-parameter sheet; returns its id. */
export async function insertDemoTemplate(dataSource: DataSource, team: Team): Promise<string> {
  const template = await createTemplate(dataSource, team.organizationId, {
    title: 'Matrix lug',
    description: 'A lug for the permission matrix (demo).',
    category: 'Lifting gear',
    parameters: [{ cellId: 'q1', name: 'F', label: 'Load', unit: 'kN', min: '0 kN' }],
    content: { format: 'sheaf-sheet', version: 1, title: 'Matrix lug', cells: [{ id: 'q1', kind: 'quantity', name: 'F', expr: '10 kN' }] },
    sourceSheetId: team.sheet.id,
    userId: team.users.owner.id,
  });
  return template.id;
}
