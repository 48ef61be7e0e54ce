import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import type { DataSource, EntityManager } from 'typeorm';
import { readSheet } from '@sheaf/engine';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { hashPassword } from '../services/passwords';
import { formatCalcNumber } from '../services/sheets';
import { DEMO_ACCOUNTS, DEMO_ORGANIZATION } from './demoAccounts';
import { BUILT_IN_DEMO_SHEETS, DEMO_PROJECTS, projectForExample, type DemoSheet } from './demoSheets';

/** What a seed run found and added. */
export interface SeedReport {
  organization: string;
  users: { total: number; added: number };
  projects: { total: number; added: number };
  sheets: { total: number; added: number };
  source: 'examples' | 'built-in';
  skipped: string[];
}

/** A stable UUID for a seed key, so a second run recognises what the first one wrote. */
export function seedUuid(key: string): string {
  const hex = createHash('sha256').update(`sheaf-seed:${key}`).digest('hex');
  const variant = ((parseInt(hex[16] as string, 16) & 0x3) | 0x8).toString(16);
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-8${hex.slice(13, 16)}-${variant}${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

/** Example sheets (`*.sheaf.json`) from the folder, each read by the engine's format reader; bad files are reported, not seeded. */
export function readExampleSheets(dir: string): { sheets: DemoSheet[]; skipped: string[] } {
  const skipped: string[] = [];
  if (!existsSync(dir)) return { sheets: [], skipped };
  const sheets: DemoSheet[] = [];
  for (const file of readdirSync(dir).filter((f) => f.endsWith('.sheaf.json')).sort()) {
    let raw: unknown;
    try {
      raw = JSON.parse(readFileSync(join(dir, file), 'utf8'));
    } catch (error) {
      skipped.push(`${file}: not valid JSON (${error instanceof Error ? error.message : String(error)})`);
      continue;
    }
    const read = readSheet(raw);
    if (!read.ok) {
      skipped.push(`${file}: ${read.errors.join('; ')}`);
      continue;
    }
    const content = read.sheet as unknown as SheetContentV1;
    const title = content.title?.trim() || basename(file, '.sheaf.json').replace(/[-_]+/g, ' ');
    sheets.push({ key: `examples/${file}`, projectCode: projectForExample(file, title).code, content: { ...content, title } });
  }
  return { sheets, skipped };
}

async function count(manager: EntityManager, sql: string, params: unknown[]): Promise<number> {
  const rows: { n: number }[] = await manager.query(sql, params);
  return rows[0]?.n ?? 0;
}

/**
 * Writes the demo organization, its four members (one per role), its projects and its sheets,
 * once. A second run adds nothing and changes nothing: every row has a natural key (e-mail, slug,
 * project code, a stable sheet id) and is inserted only when missing.
 */
export async function seedDemo(dataSource: DataSource, options: { examplesDir: string }): Promise<SeedReport> {
  const examples = readExampleSheets(options.examplesDir);
  const demoSheets = examples.sheets.length > 0 ? examples.sheets : BUILT_IN_DEMO_SHEETS;

  const existingEmails = new Set(
    ((await dataSource.query(`SELECT email FROM users WHERE email = ANY($1)`, [DEMO_ACCOUNTS.map((a) => a.email)])) as { email: string }[]).map(
      (r) => r.email,
    ),
  );
  // Hash only for accounts still missing: argon2 is slow on purpose.
  const hashes = new Map<string, string>();
  for (const account of DEMO_ACCOUNTS) {
    if (!existingEmails.has(account.email)) hashes.set(account.email, await hashPassword(account.password));
  }

  return dataSource.transaction(async (manager) => {
    // Two seeds at once (two terminals running start) take turns.
    await manager.query(`SELECT pg_advisory_xact_lock(hashtext('sheaf-demo-seed'))`);
    let usersAdded = 0;
    for (const account of DEMO_ACCOUNTS) {
      const hash = hashes.get(account.email);
      if (!hash) continue;
      const rows: unknown[] = await manager.query(
        `INSERT INTO users (email, name, password_hash, email_verified_at) VALUES ($1, $2, $3, now())
         ON CONFLICT (email) DO NOTHING RETURNING id`,
        [account.email, account.name, hash],
      );
      usersAdded += rows.length;
    }

    await manager.query(`INSERT INTO organizations (name, slug) VALUES ($1, $2) ON CONFLICT (slug) DO NOTHING`, [
      DEMO_ORGANIZATION.name,
      DEMO_ORGANIZATION.slug,
    ]);
    const org = ((await manager.query(`SELECT id FROM organizations WHERE slug = $1`, [DEMO_ORGANIZATION.slug])) as { id: string }[])[0];
    if (!org) throw new Error('the demo organization could not be written');

    for (const account of DEMO_ACCOUNTS) {
      await manager.query(
        `INSERT INTO memberships (organization_id, user_id, role)
         SELECT $1, id, $3 FROM users WHERE email = $2
         ON CONFLICT (organization_id, user_id) DO NOTHING`,
        [org.id, account.email, account.role],
      );
    }

    let projectsAdded = 0;
    for (const project of DEMO_PROJECTS) {
      const rows: unknown[] = await manager.query(
        `INSERT INTO projects (organization_id, name, code) VALUES ($1, $2, $3)
         ON CONFLICT (organization_id, code) DO NOTHING RETURNING id`,
        [org.id, project.name, project.code],
      );
      projectsAdded += rows.length;
    }

    const engineer = DEMO_ACCOUNTS.find((a) => a.role === 'engineer');
    let sheetsAdded = 0;
    for (const demo of demoSheets) {
      const id = seedUuid(`${DEMO_ORGANIZATION.slug}/${demo.key}`);
      if ((await count(manager, `SELECT count(*)::int AS n FROM sheets WHERE id = $1`, [id])) > 0) continue;
      // TypeORM answers an UPDATE with [rows, count].
      const [next]: [{ project_id: string; seq: number; code: string }[], number] = await manager.query(
        `UPDATE projects SET next_calc_seq = next_calc_seq + 1 WHERE organization_id = $1 AND code = $2
         RETURNING id AS project_id, next_calc_seq - 1 AS seq, code`,
        [org.id, demo.projectCode],
      );
      const allocated = next[0];
      if (!allocated) throw new Error(`demo project ${demo.projectCode} is missing`);
      const title = demo.content.title ?? demo.key;
      await manager.query(
        `INSERT INTO sheets (id, organization_id, project_id, title, calc_number, content, created_by_user_id)
         VALUES ($1, $2, $3, $4, $5, $6::jsonb, (SELECT id FROM users WHERE email = $7))`,
        [id, org.id, allocated.project_id, title.slice(0, 200), formatCalcNumber(allocated.code, allocated.seq), JSON.stringify(demo.content), engineer?.email],
      );
      sheetsAdded += 1;
    }

    return {
      organization: DEMO_ORGANIZATION.name,
      users: { total: DEMO_ACCOUNTS.length, added: usersAdded },
      projects: { total: await count(manager, `SELECT count(*)::int AS n FROM projects WHERE organization_id = $1`, [org.id]), added: projectsAdded },
      sheets: { total: await count(manager, `SELECT count(*)::int AS n FROM sheets WHERE organization_id = $1`, [org.id]), added: sheetsAdded },
      source: examples.sheets.length > 0 ? 'examples' : 'built-in',
      skipped: examples.skipped,
    };
  });
}
