import { execFile } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { setUpRoles } from '../../../scripts/lib/databaseRoles.mjs';
import { DEMO_ACCOUNTS, DEMO_ORGANIZATION, DEMO_PASSWORD } from '../src/db/demoAccounts';
import { BUILT_IN_DEMO_SHEETS, DEMO_PROJECTS } from '../src/db/demoSheets';
import { migrateDatabase } from '../src/db/migrateDatabase';
import { dataSourceOptions } from '../src/db/options';
import { seedDemo } from '../src/db/seedDemo';
import { startTestServer, type TestServer } from './helpers/testServer';

const run = promisify(execFile);
const packageDir = resolve(import.meta.dirname, '..');
const tsx = resolve(packageDir, '../../node_modules/.bin/tsx');
// Each entry point is a fresh tsx process: seconds each, more on a busy machine.
const ENTRY_POINT_TIMEOUT_MS = 180_000;
const TABLES = ['users', 'identities', 'organizations', 'memberships', 'invitations', 'password_resets', 'projects', 'sheets', 'audit_events'];

/** A database of its own (with the owner and app roles), so counting every table is not disturbed by other test files. */
async function freshDatabase(): Promise<{ url: string; ownerUrl: string; drop: () => Promise<void> }> {
  const adminUrl = inject('adminUrl');
  const name = `sheaf_seed_${randomBytes(5).toString('hex')}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const roles = await setUpRoles(adminUrl, name);
  return {
    url: roles.appUrl,
    ownerUrl: roles.ownerUrl,
    drop: async () => {
      const again = new pg.Client({ connectionString: adminUrl });
      await again.connect();
      await again.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await again.end();
    },
  };
}

async function counts(url: string): Promise<Record<string, number>> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const result: Record<string, number> = {};
    for (const table of TABLES) result[table] = (await client.query(`SELECT count(*)::int AS n FROM ${table}`)).rows[0].n;
    return result;
  } finally {
    await client.end();
  }
}

describe('the migrate and seed entry points', () => {
  let db: { url: string; ownerUrl: string; drop: () => Promise<void> };
  let firstOutput: string;

  beforeAll(async () => {
    db = await freshDatabase();
    const env = { ...process.env, DATABASE_URL: db.url, DATABASE_OWNER_URL: db.ownerUrl, NODE_ENV: 'development' };
    const migrated = await run(tsx, ['src/db/migrate.ts'], { cwd: packageDir, env });
    expect(migrated.stdout).toContain('Initial1796140000000');
    firstOutput = (await run(tsx, ['src/db/seed.ts'], { cwd: packageDir, env })).stdout;
  }, ENTRY_POINT_TIMEOUT_MS);
  afterAll(async () => {
    await db?.drop();
  });

  it('migrates again without change and seeds the demo organization once', async () => {
    const env = { ...process.env, DATABASE_URL: db.url, DATABASE_OWNER_URL: db.ownerUrl, NODE_ENV: 'development' };
    expect((await run(tsx, ['src/db/migrate.ts'], { cwd: packageDir, env })).stdout).toContain('is up to date');
    const before = await counts(db.url);
    expect(before).toMatchObject({ users: 4, organizations: 1, memberships: 4, projects: DEMO_PROJECTS.length });
    expect(before.sheets).toBeGreaterThanOrEqual(1);

    const second = await run(tsx, ['src/db/seed.ts'], { cwd: packageDir, env });
    expect(second.stdout).toContain('already seeded, nothing added');
    expect(await counts(db.url)).toEqual(before);
  }, ENTRY_POINT_TIMEOUT_MS);

  it('prints counts, never a password or a hash', () => {
    expect(firstOutput).toMatch(/^demo organization "Northgate Lifting Ltd\.": 4 members, 6 projects, \d+ sheets \(added 4 users, 6 projects/);
    expect(firstOutput).not.toContain(DEMO_PASSWORD);
    expect(firstOutput).not.toContain('$argon2');
  });

  describe('signing in to the seeded organization', () => {
    let server: TestServer;
    beforeAll(async () => {
      server = await startTestServer({ env: { DATABASE_URL: db.url } });
    });
    afterAll(async () => {
      await server?.close();
    });

    it('lets each demo account sign in with the documented password and the role it is listed with', async () => {
      for (const account of DEMO_ACCOUNTS) {
        const client = server.client();
        await client.signIn(account.email, DEMO_PASSWORD);
        const me = await client.get('/api/auth/me');
        expect(me.body.memberships).toEqual([{ organization: { id: expect.any(String), ...DEMO_ORGANIZATION }, role: account.role }]);
      }
    });

    it('serves the seeded sheets in sheet format version 1 under calc numbers of their projects', async () => {
      const client = server.client();
      await client.signIn('viewer@demo.sheaf.test', DEMO_PASSWORD);
      const orgId = (await client.get('/api/orgs')).body.organizations[0].id;
      const sheets = (await client.get(`/api/orgs/${orgId}/sheets`)).body.sheets as { id: string; calcNumber: string }[];
      expect(sheets.length).toBeGreaterThanOrEqual(1);
      for (const summary of sheets) {
        expect(DEMO_PROJECTS.map((p) => p.code)).toContain(summary.calcNumber.split('-')[0]);
        const detail = (await client.get(`/api/sheets/${summary.id}`)).body.sheet;
        expect(detail.content).toMatchObject({ format: 'sheaf-sheet', version: 1 });
        expect(detail.content.cells.length).toBeGreaterThan(0);
      }
    });
  });
});

describe('seeding from example files', () => {
  let db: { url: string; ownerUrl: string; drop: () => Promise<void> };
  let dataSource: DataSource;

  beforeAll(async () => {
    db = await freshDatabase();
    await migrateDatabase(db.ownerUrl);
    dataSource = new DataSource(dataSourceOptions(db.url, 2));
    await dataSource.initialize();
  });
  afterAll(async () => {
    await dataSource?.destroy();
    await db?.drop();
  });

  it('files each valid example under the project its name points to, reports bad files, and stays idempotent', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sheaf-examples-'));
    const pulley = { ...BUILT_IN_DEMO_SHEETS[4]?.content, title: 'Hub bore, worst load' };
    writeFileSync(join(dir, 'pulley-hub.sheaf.json'), JSON.stringify(pulley));
    writeFileSync(join(dir, 'soil-under-pad.sheaf.json'), JSON.stringify({ ...BUILT_IN_DEMO_SHEETS[5]?.content, title: undefined }));
    writeFileSync(join(dir, 'broken.sheaf.json'), JSON.stringify({ format: 'sheaf-sheet', version: 1, cells: [{ id: 'a' }] }));
    writeFileSync(join(dir, 'notes.txt'), 'not a sheet');

    const first = await seedDemo(dataSource, { examplesDir: dir });
    expect(first).toMatchObject({ source: 'examples', sheets: { total: 2, added: 2 } });
    expect(first.skipped).toEqual([
      "broken.sheaf.json: cells[0].kind: Invalid discriminator value. Expected 'note' | 'quantity' | 'stress' | 'rosette' | 'rotate' | 'principal' | 'criterion' | 'pointset'",
    ]);
    const rows: { calc_number: string; title: string }[] = await dataSource.query(`SELECT calc_number, title FROM sheets ORDER BY calc_number`);
    expect(rows).toEqual([
      { calc_number: 'FPD-001', title: 'soil under pad' },
      { calc_number: 'PHB-001', title: 'Hub bore, worst load' },
    ]);

    const second = await seedDemo(dataSource, { examplesDir: dir });
    expect(second).toMatchObject({ users: { added: 0 }, projects: { added: 0 }, sheets: { total: 2, added: 0 } });
  });
});
