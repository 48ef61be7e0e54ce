import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody, HealthResponse } from '@sheaf/engine/api';
import { openApiPath, REDIRECT_ROUTES } from '../src/openapi/document';
import { permissionName } from '../src/routes/defineRoute';
import { startTestServer, type TestServer } from './helpers/testServer';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every method + path the Express app actually mounted, found by walking its router. */
function mountedRoutes(stack: Layer[]): string[] {
  const found: string[] = [];
  for (const layer of stack) {
    if (layer.route) {
      for (const method of Object.keys(layer.route.methods)) {
        if (method !== '_all') found.push(`${method.toUpperCase()} ${layer.route.path}`);
      }
    } else if (layer.handle?.stack) {
      found.push(...mountedRoutes(layer.handle.stack));
    }
  }
  return found;
}

describe('health, OpenAPI and the shape of errors', () => {
  let server: TestServer;
  let webDist: string;
  let fonts: string;

  beforeAll(async () => {
    const scratch = mkdtempSync(join(tmpdir(), 'sheaf-web-'));
    webDist = join(scratch, 'dist');
    fonts = join(scratch, 'fonts');
    mkdirSync(fonts);
    writeFileSync(join(fonts, 'plex-mono.woff2'), 'not really a font');
    server = await startTestServer({ overrides: { paths: { webDist, fonts } } });
  });
  afterAll(async () => {
    await server?.close();
  });

  it('reports health with a measured database round trip', async () => {
    const response = await server.client().get('/api/health');
    expect(response.status).toBe(200);
    const health = HealthResponse.parse(response.body);
    expect(health.version).toMatch(/^\d+\.\d+\.\d+/);
    expect(health.db.roundTripMs).toBeGreaterThan(0);
  });

  it('documents every mounted API and sign-in route in OpenAPI 3.1, each with its permission', async () => {
    const response = await server.client().get('/api/openapi.json');
    expect(response.status).toBe(200);
    const doc = response.body as { openapi: string; paths: Record<string, Record<string, { 'x-sheaf-permission'?: string }>> };
    expect(doc.openapi).toBe('3.1.0');

    const documented = Object.entries(doc.paths).flatMap(([path, operations]) =>
      Object.keys(operations).map((method) => `${method.toUpperCase()} ${path}`),
    );
    const mounted = mountedRoutes((server.app as unknown as { router: { stack: Layer[] } }).router.stack)
      .filter((entry) => / \/(api|auth)\//.test(entry))
      .map((entry) => {
        const [method, path] = entry.split(' ');
        return `${method} ${openApiPath(path as string)}`;
      });
    expect(mounted.length).toBeGreaterThan(20);
    expect([...new Set(documented)].sort()).toEqual([...new Set(mounted)].sort());

    for (const route of server.routes) {
      const operation = doc.paths[openApiPath(route.path)]?.[route.method];
      expect(operation?.['x-sheaf-permission'], route.id).toBe(permissionName(route.access));
    }
    for (const redirect of REDIRECT_ROUTES) expect(doc.paths[redirect.path]?.get?.['x-sheaf-permission']).toBe('public');
    expect(doc.paths['/api/sheets/{sheetId}']?.patch?.['x-sheaf-permission']).toBe('sheet.edit');
    expect(doc.paths['/api/orgs/{orgId}/invitations']?.post?.['x-sheaf-permission']).toBe('org.manageMembers');
  });

  it('answers unknown API paths, malformed JSON and bad ids with the error shape', async () => {
    const client = server.client();
    const unknown = await client.get('/api/no-such-thing');
    expect(unknown.status).toBe(404);
    expect(ErrorBody.parse(unknown.body).error).toEqual({ code: 'not-found', message: 'no API route GET /api/no-such-thing' });

    const malformed = await client.request('POST', '/api/auth/signin', { rawBody: '{"email": ' });
    expect(malformed.status).toBe(400);
    expect(ErrorBody.parse(malformed.body).error).toEqual({ code: 'invalid-field', message: 'body: not valid JSON' });

    const missing = await client.post('/api/auth/signup', {});
    expect(missing.status).toBe(400);
    expect(missing.body.error.code).toBe('invalid-field');
    expect(missing.body.error.message).toBe('email: is required; password: is required; name: is required');
  });

  it('sends security headers: same-origin content policy with inline styles for formulas', async () => {
    const response = await server.client().get('/api/health');
    const csp = response.headers.get('content-security-policy') ?? '';
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("style-src 'self' 'unsafe-inline'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toMatch(/https?:\/\//);
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('x-powered-by')).toBeNull();
    expect(response.headers.get('x-request-id')).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('answers 503 with build instructions while the web app is not built, then serves it with a client-side fallback', async () => {
    const client = server.client();
    const before = await client.get('/projects/anything');
    expect(before.status).toBe(503);
    expect(before.text).toContain('npm run build --workspace @sheaf/web');

    mkdirSync(join(webDist, 'assets'), { recursive: true });
    writeFileSync(join(webDist, 'index.html'), '<!doctype html><title>Sheaf</title><div id="root"></div>');
    writeFileSync(join(webDist, 'assets', 'app-1234.js'), 'console.log("sheaf")');

    const page = await client.get('/projects/anything');
    expect(page.status).toBe(200);
    expect(page.text).toContain('<div id="root">');
    const asset = await client.get('/assets/app-1234.js');
    expect(asset.status).toBe(200);
    expect(asset.headers.get('cache-control')).toContain('immutable');
    expect((await client.get('/assets/gone-0000.js')).status).toBe(404);
    // API paths never fall back to the page.
    expect((await client.get('/api/projects')).status).toBe(404);
  });

  it('serves the shared fonts at /fonts/', async () => {
    const font = await server.client().get('/fonts/plex-mono.woff2');
    expect(font.status).toBe(200);
    expect(font.text).toBe('not really a font');
    expect((await server.client().get('/fonts/missing.woff2')).status).toBe(404);
  });

  it('refuses websocket upgrades outside /collab/:sheetId', async () => {
    const { request } = await import('node:http');
    const status = await new Promise<number>((resolve, reject) => {
      const req = request(`${server.url}/not-collab`, {
        headers: { connection: 'Upgrade', upgrade: 'websocket', 'sec-websocket-version': '13', 'sec-websocket-key': 'dGhlIHNhbXBsZSBub25jZQ==' },
      });
      req.on('response', (res) => resolve(res.statusCode ?? 0));
      req.on('upgrade', () => resolve(101));
      req.on('error', reject);
      req.end();
    });
    expect(status).toBe(404);
  });
});

describe('in production', () => {
  let server: TestServer;

  beforeAll(async () => {
    server = await startTestServer({
      env: {
        NODE_ENV: 'production',
        SESSION_SECRET: 'a production-length secret for this test only',
        PUBLIC_URL: 'https://calcs.northgate.test',
        // Never contacted: this test sends no mail.
        SMTP_URL: 'smtp://127.0.0.1:9',
      },
    });
  });
  afterAll(async () => {
    await server?.close();
  });

  it('mounts none of the local fakes and turns provider sign-in off', async () => {
    const client = server.client();
    expect(server.deps.devInbox).toBeNull();
    expect((await client.get('/api/dev/mail')).status).toBe(404);
    expect((await client.get('/dev/mail')).status).toBe(404);
    expect((await client.get('/fake-oauth/authorize?client_id=sheaf-dev-client')).status).toBe(404);
    const github = await client.get('/auth/github');
    expect(github.status).toBe(302);
    expect(github.location).toBe('/signin?error=github-not-configured');
    const doc = (await client.get('/api/openapi.json')).body as { paths: Record<string, unknown> };
    expect(doc.paths['/api/dev/mail']).toBeUndefined();
  });

  it('marks the session cookie Secure behind one TLS proxy hop, and sends HSTS', async () => {
    const response = await server.client().get('/api/auth/csrf', { headers: { 'x-forwarded-proto': 'https' } });
    const cookie = response.headers.getSetCookie().find((c) => c.startsWith('sheaf.sid='));
    expect(cookie).toMatch(/; HttpOnly/);
    expect(cookie).toMatch(/; Secure/);
    expect(cookie).toMatch(/; SameSite=Lax/);
    expect(response.headers.get('strict-transport-security')).toContain('max-age=');
    expect(response.headers.get('content-security-policy')).toContain('upgrade-insecure-requests');
  });
});

