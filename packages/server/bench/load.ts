/**
 * Load benchmark (figures are printed, never asserted): `npm run bench:load`.
 *
 * The server runs in a child process in production mode, as deployed; autocannon and the
 * websocket clients run in this process, on the same loopback (and the same cores: on a small
 * machine the load generator takes its share of the CPU, so the figures are a floor).
 *
 * HTTP: p50/p95/p99 and requests per second for the main read routes — a project's sheet list,
 * a sheet, its review state, its revisions — at 20 and 100 connections as fast as the server
 * answers, and at an offered 500 requests per second.
 * Websockets: 50 editors typing on one sheet, and 500 clients over 50 sheets (one typing per
 * sheet): keystroke-to-remote-view latency, server CPU and memory.
 *
 * Runs against DATABASE_URL when set, otherwise in a throwaway database on the project cluster.
 * BENCH_SECONDS (default 8) sets the length of each HTTP run, BENCH_WS_SECONDS (default 15) of
 * each typing run; BENCH_ONLY=http or ws runs one half, BENCH_ROUTES a comma-separated choice of
 * routes; BENCH_CPU_PROF=<folder> has the server write a CPU profile there.
 */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { loadavg } from 'node:os';
import { DataSource } from 'typeorm';
import { dataSourceOptions } from '../src/db/options';
import { createPasswordUser } from '../src/services/accounts';
import { insertOrganization } from '../src/services/organizations';
import { ApiSession } from './support/apiSession';
import { openBenchDatabase } from './support/benchDatabase';
import { benchSheet } from './support/benchSheet';
import { loadRoute, type HttpRun } from './support/httpLoad';
import { startServerProcess, type ServerProcess } from './support/serverProcess';
import { runEditors, type EditorScenario } from './support/wsLoad';
import { freePort } from '../test/helpers/throwawayCluster';

const PASSWORD = 'benchmark password, long enough';
// Every y-websocket client listens for the process's exit.
process.setMaxListeners(1000);
const SHEETS = 50;
const REVISIONS = 3;
const ENGINEERS = 10;
const HTTP_SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const WS_SECONDS = Number(process.env.BENCH_WS_SECONDS ?? 15);
const ONLY = process.env.BENCH_ONLY ?? 'all';
/** BENCH_ROUTES="sheet list,review": only these HTTP routes. */
const ROUTES = process.env.BENCH_ROUTES?.split(',').map((name) => name.trim());
/** A production server behind one proxy: requests say they came over https, so secure cookies work. */
const FORWARDED = { 'x-forwarded-proto': 'https' };

const ms = (value: number): string => value.toFixed(1).padStart(6);
const mib = (bytes: number): string => `${(bytes / 1024 / 1024).toFixed(0)} MiB`;
const load = (): string => loadavg().map((value) => value.toFixed(2)).join(' ');

interface Seeded {
  projectId: string;
  sheetIds: string[];
  revisedSheetId: string;
  engineers: ApiSession[];
}

/** Accounts straight into the database; sheets, checks and approvals through the API. */
async function seed(databaseUrl: string, server: ServerProcess): Promise<Seeded> {
  const dataSource = new DataSource(dataSourceOptions(databaseUrl, 2));
  await dataSource.initialize();
  const emails: string[] = [];
  let checkerEmail = '';
  let checkerId = '';
  let organizationId = '';
  try {
    const organization = await insertOrganization(dataSource.manager, `Northgate bench ${randomBytes(3).toString('hex')}`);
    organizationId = organization.id;
    for (let index = 0; index <= ENGINEERS; index++) {
      const email = `bench-${index}-${randomBytes(4).toString('hex')}@bench.sheaf.test`;
      const user = await createPasswordUser(dataSource.manager, { email, password: PASSWORD, name: `Bench ${index}` });
      const role = index === ENGINEERS ? 'checker' : 'engineer';
      await dataSource.query(`INSERT INTO memberships (organization_id, user_id, role) VALUES ($1, $2, $3)`, [organization.id, user.id, role]);
      if (role === 'checker') {
        checkerEmail = email;
        checkerId = user.id;
      } else emails.push(email);
    }
  } finally {
    await dataSource.destroy();
  }
  const engineers: ApiSession[] = [];
  for (const email of emails) engineers.push(await ApiSession.signIn(server.url, email, PASSWORD, FORWARDED));
  const checker = await ApiSession.signIn(server.url, checkerEmail, PASSWORD, FORWARDED);
  const engineer = engineers[0]!;
  const project = (await engineer.request('POST', `/api/orgs/${organizationId}/projects`, { name: 'Bench gantry', code: 'BG' })) as {
    project: { id: string };
  };
  const sheetIds: string[] = [];
  for (let index = 0; index < SHEETS; index++) {
    const content = { ...benchSheet(), title: `Bench sheet ${index + 1}` };
    const created = (await engineer.request('POST', `/api/projects/${project.project.id}/sheets`, { title: content.title, content })) as {
      sheet: { id: string };
    };
    sheetIds.push(created.sheet.id);
  }
  const revisedSheetId = sheetIds[0]!;
  for (let revision = 1; revision <= REVISIONS; revision++) {
    await engineer.request('POST', `/api/sheets/${revisedSheetId}/submit`, { checkerUserId: checkerId });
    await checker.request('POST', `/api/sheets/${revisedSheetId}/approve`, {});
    if (revision < REVISIONS) await engineer.request('PATCH', `/api/sheets/${revisedSheetId}`, { title: `Bench sheet 1, revision ${revision + 1}` });
  }
  return { projectId: project.project.id, sheetIds, revisedSheetId, engineers };
}

async function httpHalf(server: ServerProcess, seeded: Seeded): Promise<void> {
  const session = seeded.engineers[0]!;
  const headers = { ...FORWARDED, cookie: session.cookie };
  const routes: Array<[string, string]> = [
    ['sheet list', `/api/projects/${seeded.projectId}/sheets`],
    ['sheet', `/api/sheets/${seeded.sheetIds[1]}`],
    ['review', `/api/sheets/${seeded.revisedSheetId}/review`],
    ['revisions', `/api/sheets/${seeded.revisedSheetId}/revisions`],
  ];
  const runs: Array<[string, HttpRun]> = [
    ['20 conn, max ', { connections: 20, seconds: HTTP_SECONDS }],
    ['100 conn, max', { connections: 100, seconds: HTTP_SECONDS }],
    ['20 conn, 500/s', { connections: 20, rate: 500, seconds: HTTP_SECONDS }],
    ['100 conn, 500/s', { connections: 100, rate: 500, seconds: HTTP_SECONDS }],
  ];
  console.log(`\nHTTP (${HTTP_SECONDS} s per run; latency in ms; server CPU in % of one core and ms per answer)`);
  console.log('  route        load              req/s     p50     p95     p99  failures  server CPU');
  for (const [name, path] of routes.filter(([name]) => !ROUTES || ROUTES.includes(name))) {
    const sizeBytes = (await (await fetch(`${server.url}${path}`, { headers })).text()).length;
    await loadRoute(`${server.url}${path}`, headers, { connections: 10, seconds: 1 }); // warm-up
    for (const [label, run] of runs) {
      const cpuBefore = server.usage().cpuSeconds;
      const started = Date.now();
      const figures = await loadRoute(`${server.url}${path}`, headers, run);
      const cpuSeconds = server.usage().cpuSeconds - cpuBefore;
      const cpu = (cpuSeconds / ((Date.now() - started) / 1000)) * 100;
      const perAnswer = (cpuSeconds * 1000) / Math.max(1, figures.responses);
      console.log(
        `  ${name.padEnd(12)} ${label.padEnd(16)} ${figures.requestsPerSecond.toFixed(0).padStart(6)}  ${ms(figures.p50)}  ${ms(figures.p95)}  ${ms(figures.p99)}  ${String(figures.failures).padStart(8)}  ${cpu.toFixed(0).padStart(5)} %  ${perAnswer.toFixed(2).padStart(5)} ms`,
      );
    }
    console.log(`  ${''.padEnd(12)} (answer ${(sizeBytes / 1024).toFixed(1)} KiB)`);
  }
}

async function wsHalf(server: ServerProcess, seeded: Seeded): Promise<void> {
  const cookies = seeded.engineers.map((session) => session.cookie);
  const scenarios: Array<[string, EditorScenario]> = [
    [
      '50 editors on one sheet, each typing a key a second',
      { sheetIds: [seeded.sheetIds[2]!], clientsPerSheet: 50, typistsPerSheet: 50, observersPerSheet: 5, editIntervalMs: 1000, seconds: WS_SECONDS },
    ],
    [
      '500 clients over 50 sheets, one typing a key every 500 ms per sheet',
      { sheetIds: seeded.sheetIds, clientsPerSheet: 10, typistsPerSheet: 1, observersPerSheet: 2, editIntervalMs: 500, seconds: WS_SECONDS },
    ],
  ];
  console.log(`\nWebsockets (${WS_SECONDS} s of typing per run; latency keystroke to another client's copy, in ms)`);
  for (const [name, scenario] of scenarios) {
    const figures = await runEditors(server.url, cookies, server, scenario);
    console.log(`  ${name}`);
    console.log(
      `    ${figures.clients} clients synced in ${figures.connectSeconds.toFixed(1)} s; ${figures.edits} keystrokes, ${figures.samples} observations${figures.lost > 0 ? `, ${figures.lost} missing` : ''}`,
    );
    console.log(`    latency p50 ${figures.p50.toFixed(1)}  p95 ${figures.p95.toFixed(1)}  p99 ${figures.p99.toFixed(1)}`);
    console.log(
      `    server CPU ${figures.serverCpuPercent.toFixed(0)} % of a core while typing; RSS ${mib(figures.serverRssBeforeBytes)} before connecting, ${mib(figures.serverRssAfterBytes)} after; clients' CPU ${figures.clientCpuPercent.toFixed(0)} %`,
    );
    // Let the rooms store, compact and unload before the next run.
    await new Promise((resolve) => setTimeout(resolve, 3000));
  }
}

async function main(): Promise<void> {
  console.log(`load average at start: ${load()} (${(await import('node:os')).cpus().length} cores)`);
  const database = await openBenchDatabase('sheaf_load');
  let server: ServerProcess | undefined;
  try {
    const port = await freePort();
    server = await startServerProcess(
      {
        NODE_ENV: 'production',
        DATABASE_URL: database.url,
        SESSION_SECRET: randomBytes(32).toString('hex'),
        PUBLIC_URL: `http://127.0.0.1:${port}`,
        SMTP_URL: 'smtp://127.0.0.1:9',
        TRUST_PROXY: '1',
        LOG_LEVEL: process.env.LOG_LEVEL ?? 'info',
      },
      port,
    );
    const seeded = await seed(database.url, server);
    console.log(`seeded: ${SHEETS} sheets of ${benchSheet().cells.length} cells, one with ${REVISIONS} approved revisions; server RSS ${mib(server.usage().rssBytes)}`);
    if (ONLY !== 'ws') await httpHalf(server, seeded);
    if (ONLY !== 'http') await wsHalf(server, seeded);
    console.log(`\nload average at end: ${load()}; server RSS ${mib(server.usage().rssBytes)}`);
  } finally {
    await server?.stop();
    await database.drop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
