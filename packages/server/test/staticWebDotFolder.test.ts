import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, type TestServer } from './helpers/testServer';

/**
 * The project installed under a folder whose name starts with a dot (~/.local/src/sheaf): the
 * web app, its assets and the fonts are served all the same, and what is missing is a 404.
 */
describe('the web app served from a project under a dot-folder', () => {
  let server: TestServer;
  let scratch: string;
  let webDist: string;

  beforeAll(async () => {
    scratch = mkdtempSync(join(tmpdir(), 'sheaf-home-'));
    const project = join(scratch, '.local', 'src', 'sheaf');
    webDist = join(project, 'packages', 'web', 'dist');
    const fonts = join(project, 'fonts');
    mkdirSync(join(webDist, 'assets'), { recursive: true });
    mkdirSync(fonts, { recursive: true });
    writeFileSync(join(webDist, 'index.html'), '<!doctype html><title>Sheaf</title><div id="root"></div>');
    writeFileSync(join(webDist, 'assets', 'app-5678.js'), 'console.log("sheaf")');
    writeFileSync(join(fonts, 'plex-sans.woff2'), 'font bytes');
    server = await startTestServer({ overrides: { paths: { webDist, fonts } } });
  });
  afterAll(async () => {
    await server?.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  it('serves the page for the root and for client-side routes', async () => {
    const client = server.client();
    for (const path of ['/', '/projects/anything', '/sheets/00000000-0000-4000-8000-000000000000/revisions/1']) {
      const page = await client.get(path);
      expect([path, page.status, page.headers.get('content-type')]).toEqual([path, 200, 'text/html; charset=utf-8']);
      expect(page.text).toContain('<div id="root">');
    }
  });

  it('serves assets and fonts, and answers 404 (not 500) for a missing one', async () => {
    const client = server.client();
    const asset = await client.get('/assets/app-5678.js');
    expect(asset.status).toBe(200);
    expect(asset.text).toBe('console.log("sheaf")');
    expect((await client.get('/fonts/plex-sans.woff2')).text).toBe('font bytes');
    for (const path of ['/assets/missing-0000.js', '/fonts/missing.woff2', '/favicon.ico', '/.env']) {
      const missing = await client.get(path);
      expect([path, missing.status]).toEqual([path, 404]);
    }
  });
});
