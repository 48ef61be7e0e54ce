import type { DataSource, EntityManager } from 'typeorm';
import type { Project as ApiProject } from '@sheaf/engine/api';
import { Project } from '../entities/Project';
import { conflict } from '../http/ApiError';

/** A project code made from a name's initials: `Hoist drive shaft` gives `HDS`. */
export function codeFromName(name: string): string {
  const words = name
    .normalize('NFKD')
    .toUpperCase()
    .split(/[^A-Z0-9]+/)
    .filter(Boolean);
  let code = words.map((w) => w[0]).join('').slice(0, 6);
  if (code.length < 2) code = (words.join('') + 'XX').slice(0, 3);
  return code;
}

function toApi(project: Project, sheetCount: number): ApiProject {
  return { id: project.id, name: project.name, code: project.code, createdAt: project.createdAt.toISOString(), sheetCount };
}

/** The organization's projects by name, with how many sheets each holds. */
export async function listProjects(dataSource: DataSource, organizationId: string): Promise<ApiProject[]> {
  const rows: { id: string; name: string; code: string; created_at: Date; sheet_count: number }[] = await dataSource.query(
    `SELECT p.id, p.name, p.code, p.created_at, count(s.id)::int AS sheet_count
       FROM projects p LEFT JOIN sheets s ON s.project_id = p.id
      WHERE p.organization_id = $1
      GROUP BY p.id
      ORDER BY lower(p.name), p.id`,
    [organizationId],
  );
  return rows.map((r) => ({ id: r.id, name: r.name, code: r.code, createdAt: r.created_at.toISOString(), sheetCount: r.sheet_count }));
}

async function tryInsert(manager: EntityManager, organizationId: string, name: string, code: string): Promise<Project | null> {
  const rows: { id: string }[] = await manager.query(
    `INSERT INTO projects (organization_id, name, code) VALUES ($1, $2, $3)
     ON CONFLICT (organization_id, code) DO NOTHING RETURNING id`,
    [organizationId, name, code],
  );
  return rows[0] ? manager.findOneByOrFail(Project, { id: rows[0].id }) : null;
}

/**
 * Creates a project. A given code must be free in the organization (409 otherwise); without one,
 * a code is made from the name's initials, numbered when taken (`HDS`, `HDS2`, ...).
 */
export async function createProject(dataSource: DataSource, organizationId: string, name: string, code?: string): Promise<ApiProject> {
  const manager = dataSource.manager;
  if (code) {
    const project = await tryInsert(manager, organizationId, name, code);
    if (!project) throw conflict(`code: project code ${code} is already used in this organization`);
    return toApi(project, 0);
  }
  const base = codeFromName(name);
  for (let n = 1; n < 1000; n += 1) {
    const candidate = n === 1 ? base : `${base.slice(0, 16 - String(n).length)}${n}`;
    const project = await tryInsert(manager, organizationId, name, candidate);
    if (project) return toApi(project, 0);
  }
  throw conflict('code: no free project code could be made from the name; give one');
}
