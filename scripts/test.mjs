#!/usr/bin/env node
// `npm test`: the same bootstrap as `npm start`, into a throwaway database created for this run;
// then every Vitest project (engine, server against real PostgreSQL, web components) and the
// browser tests (playwright-core driving Debian's Chromium). Exits non-zero on any failure.
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureChromium } from './lib/chromium.mjs';
import { ensureNpmPackages } from './lib/deps.mjs';
import { dropDatabase, prepareDatabase } from './lib/database.mjs';
import { fail, step } from './lib/log.mjs';
import { ROOT } from './lib/paths.mjs';
import { otherLiveLeases, stopCluster, takeLease } from './lib/postgres.mjs';
import { run } from './lib/run.mjs';
import { countsFromVitestJson } from './lib/summary.mjs';

const args = process.argv.slice(2);
const only = args.includes('--unit') ? 'unit' : args.includes('--e2e') ? 'e2e' : 'all';

try {
  ensureNpmPackages(ROOT);
} catch (error) {
  fail(`could not install the npm packages: ${error.message}`);
}
let chromium = '';
if (only !== 'unit') {
  try {
    chromium = ensureChromium();
  } catch (error) {
    fail(`could not install Chromium for the browser tests: ${error.message}`);
  }
}

const releaseLease = takeLease(ROOT);
const runId = `${Date.now().toString(36)}_${process.pid}`;
const created = [];
let exitCode = 1;

try {
  const unitDb = await prepareDatabase(ROOT, { databaseName: `sheaf_test_${runId}` });
  created.push(unitDb);
  const e2eDb = await prepareDatabase(ROOT, { databaseName: `sheaf_e2e_${runId}` });
  created.push(e2eDb);

  const reports = join(ROOT, 'reports');
  mkdirSync(reports, { recursive: true });
  const env = {
    ...process.env,
    NODE_ENV: 'test',
    TURBO_TELEMETRY_DISABLED: '1',
    SHEAF_PG_ADMIN_URL: unitDb.adminUrl,
    CHROMIUM_PATH: chromium,
  };
  const vitest = join(ROOT, 'node_modules', '.bin', 'vitest');
  const results = [];

  if (only !== 'e2e') {
    step(`unit and integration tests (database ${unitDb.name})`);
    const unitJson = join(reports, 'unit.json');
    rmSync(unitJson, { force: true });
    const unit = run(vitest, ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${unitJson}`], {
      cwd: ROOT,
      env: { ...env, DATABASE_URL: unitDb.url, DATABASE_OWNER_URL: unitDb.ownerUrl },
      allowFail: true,
    });
    results.push({ name: 'unit', status: unit.status, counts: countsFromVitestJson(unitJson) });
  }

  if (only !== 'unit') {
    step(`browser tests (database ${e2eDb.name})`);
    const e2eJson = join(reports, 'e2e.json');
    rmSync(e2eJson, { force: true });
    const e2e = run(vitest, ['run', '--config', 'e2e/vitest.config.ts', '--reporter=default', '--reporter=json', `--outputFile.json=${e2eJson}`], {
      cwd: ROOT,
      env: { ...env, DATABASE_URL: e2eDb.url, DATABASE_OWNER_URL: e2eDb.ownerUrl },
      allowFail: true,
    });
    results.push({ name: 'browser', status: e2e.status, counts: countsFromVitestJson(e2eJson) });
  }

  let passed = 0;
  let failed = 0;
  let skipped = 0;
  for (const r of results) {
    const c = r.counts ?? { passed: 0, failed: 0, skipped: 0, failedSuites: 0 };
    process.stdout.write(`[sheaf] ${r.name}: ${c.passed} passed, ${c.failed} failed, exit ${r.status}\n`);
    passed += c.passed;
    failed += c.failed + (r.status !== 0 && c.failed === 0 ? 1 : 0);
    skipped += c.skipped;
  }
  process.stdout.write(`\nTotal: ${passed} passed, ${failed} failed, ${skipped} skipped\n`);
  exitCode = failed === 0 && results.every((r) => r.status === 0) && passed > 0 ? 0 : 1;
} catch (error) {
  process.stderr.write(`[sheaf] test bootstrap failed: ${error.stack ?? error}\n`);
  exitCode = 1;
} finally {
  if (process.env.SHEAF_KEEP_TEST_DB !== '1') {
    for (const db of created) {
      await dropDatabase(db.adminUrl, db.name).catch(() => {});
    }
  }
  releaseLease();
  const startedHere = created.some((db) => db.startedHere);
  if (startedHere && otherLiveLeases(ROOT) === 0 && !process.env.DATABASE_URL) stopCluster(ROOT);
}
process.exit(exitCode);
