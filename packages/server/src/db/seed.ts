import 'reflect-metadata';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { DataSource } from 'typeorm';
import { databaseUrlFromEnv } from '../config';
import { dataSourceOptions } from './options';
import { seedDemo } from './seedDemo';

/**
 * `tsx packages/server/src/db/seed.ts`: writes the demo organization into DATABASE_URL once
 * (running it again changes nothing). Sheets come from the top-level examples/ folder when it
 * holds `*.sheaf.json` files. Prints counts only, never credentials or hashes.
 */
const examplesDir = resolve(fileURLToPath(new URL('.', import.meta.url)), '../../../../examples');

const dataSource = new DataSource(dataSourceOptions(databaseUrlFromEnv(), 2));
try {
  await dataSource.initialize();
  const report = await seedDemo(dataSource, { examplesDir });
  const added = report.users.added + report.projects.added + report.sheets.added;
  process.stdout.write(
    `demo organization "${report.organization}": ${report.users.total} members, ${report.projects.total} projects, ` +
      `${report.sheets.total} sheets (${added === 0 ? 'already seeded, nothing added' : `added ${report.users.added} users, ${report.projects.added} projects, ${report.sheets.added} sheets from ${report.source === 'examples' ? 'examples/' : 'built-in demo sheets'}`})\n`,
  );
  for (const line of report.skipped) process.stderr.write(`seed: skipped example ${line}\n`);
} catch (error) {
  process.stderr.write(`seed failed: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 1;
} finally {
  if (dataSource.isInitialized) await dataSource.destroy();
}
