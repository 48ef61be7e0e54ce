import { z } from 'zod';
import { HealthResponse } from '@sheaf/engine/api';
import { databaseUnavailable } from '../http/errorHandler';
import { buildOpenApiDocument } from '../openapi/document';
import { defineRoute, ok, type Route } from './defineRoute';
import type { RouteKit } from './kit';

/** How long health waits for the database before calling it unreachable. */
const HEALTH_TIMEOUT_MS = 2_000;

/** `SELECT 1` with a deadline: resolves to the round trip in ms, or rejects. */
async function pingDatabase(query: () => Promise<unknown>): Promise<number> {
  const started = process.hrtime.bigint();
  let timer: NodeJS.Timeout | undefined;
  const deadline = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error('timeout exceeded when trying to connect')), HEALTH_TIMEOUT_MS);
  });
  try {
    await Promise.race([query(), deadline]);
  } finally {
    clearTimeout(timer);
  }
  return Number(process.hrtime.bigint() - started) / 1e6;
}

/** Health and the API's own description. */
export function systemRoutes(kit: RouteKit): Route[] {
  let document: unknown;
  return [
    defineRoute({
      id: 'system.health',
      method: 'get',
      path: '/api/health',
      summary: 'Liveness with a database round trip; 503 unavailable (with Retry-After) while the database does not answer',
      tag: 'system',
      access: { kind: 'public' },
      response: { status: 200, description: 'The server and its database answer', schema: HealthResponse },
      errors: [503],
      handler: async ({ deps, req }) => {
        let roundTripMs: number;
        try {
          roundTripMs = await pingDatabase(() => deps.dataSource.query('SELECT 1'));
        } catch (error) {
          req.log?.warn({ err: error }, 'health: the database does not answer');
          throw databaseUnavailable();
        }
        return ok({ status: 'ok', version: deps.version, db: { state: 'up', roundTripMs: Math.round(roundTripMs * 100) / 100 } });
      },
    }),
    defineRoute({
      id: 'system.openapi',
      method: 'get',
      path: '/api/openapi.json',
      summary: 'This API as an OpenAPI 3.1 document, generated from the schemas that validate requests',
      tag: 'system',
      access: { kind: 'public' },
      response: { status: 200, description: 'The OpenAPI document', schema: z.record(z.string(), z.unknown()) },
      handler: async ({ deps }) => {
        document ??= buildOpenApiDocument(kit.routes(), { version: deps.version, publicUrl: deps.urls.publicUrl });
        return ok(document);
      },
    }),
  ];
}
