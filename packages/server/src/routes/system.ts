import { z } from 'zod';
import { HealthResponse } from '@sheaf/engine/api';
import { buildOpenApiDocument } from '../openapi/document';
import { defineRoute, ok, type Route } from './defineRoute';
import type { RouteKit } from './kit';

/** Health and the API's own description. */
export function systemRoutes(kit: RouteKit): Route[] {
  let document: unknown;
  return [
    defineRoute({
      id: 'system.health',
      method: 'get',
      path: '/api/health',
      summary: 'Liveness with a database round trip',
      tag: 'system',
      access: { kind: 'public' },
      response: { status: 200, description: 'The server and its database answer', schema: HealthResponse },
      handler: async ({ deps }) => {
        const started = process.hrtime.bigint();
        await deps.dataSource.query('SELECT 1');
        const roundTripMs = Number(process.hrtime.bigint() - started) / 1e6;
        return ok({ status: 'ok', version: deps.version, db: { roundTripMs: Math.round(roundTripMs * 100) / 100 } });
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
