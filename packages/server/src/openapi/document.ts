import { OpenAPIRegistry, OpenApiGeneratorV31 } from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import { ErrorBody } from '@sheaf/engine/api';
import { isStateChanging, permissionName, type HttpMethod, type Route } from '../routes/defineRoute';

/** A route outside /api that the document still lists (browser redirects of provider sign-in). */
export interface DocumentedRedirect {
  method: HttpMethod;
  path: string;
  summary: string;
  tag: string;
}

/** The provider sign-in redirects, documented beside the API. */
export const REDIRECT_ROUTES: DocumentedRedirect[] = [
  { method: 'get', path: '/auth/github', summary: 'Start GitHub sign-in: redirects to the provider', tag: 'auth' },
  {
    method: 'get',
    path: '/auth/github/callback',
    summary: 'Where the provider sends the browser back; signs in and redirects to / (or /signin?error=... on failure)',
    tag: 'auth',
  },
];

const ERROR_DESCRIPTIONS: Record<number, string> = {
  400: 'invalid-field: the message names each field at fault',
  401: 'not-signed-in',
  403: 'forbidden (the role lacks the permission) or csrf (missing or wrong x-csrf-token)',
  404: 'not-found: no such resource, or it belongs to an organization you are not a member of',
  409: 'conflict or last-owner',
  410: 'expired',
  429: 'rate-limited',
  502: 'an outside service (mail) failed',
};

/** `/api/sheets/:sheetId` in OpenAPI's spelling: `/api/sheets/{sheetId}`. */
export function openApiPath(expressPath: string): string {
  return expressPath.replace(/:(\w+)/g, '{$1}');
}

function errorStatuses(route: Route): number[] {
  const statuses = new Set<number>(route.errors ?? []);
  if (route.body || route.query) statuses.add(400);
  if (isStateChanging(route.method)) statuses.add(403);
  if (route.access.kind !== 'public') statuses.add(401);
  if (route.access.kind === 'permission') {
    statuses.add(403);
    statuses.add(404);
  }
  if (route.params) statuses.add(404);
  return [...statuses].sort((a, b) => a - b);
}

const CsrfHeader = z.object({
  'x-csrf-token': z.string().meta({ description: 'The token from GET /api/auth/csrf' }),
});

/**
 * The OpenAPI 3.1 document of every route, generated from the same zod schemas that validate
 * requests. Each operation carries the permission it needs in `x-sheaf-permission`: `public`,
 * `signed-in`, or an action of the permission table (such as `sheet.edit`).
 */
export function buildOpenApiDocument(routes: Route[], info: { version: string; publicUrl: string }): object {
  const registry = new OpenAPIRegistry();

  for (const route of routes) {
    const responses: Record<string, unknown> = {
      [route.response.status]: route.response.schema
        ? { description: route.response.description, content: { 'application/json': { schema: route.response.schema } } }
        : { description: route.response.description },
    };
    for (const status of errorStatuses(route)) {
      responses[status] = {
        description: ERROR_DESCRIPTIONS[status] ?? 'error',
        content: { 'application/json': { schema: ErrorBody } },
      };
    }
    registry.registerPath({
      method: route.method,
      path: openApiPath(route.path),
      operationId: route.id,
      summary: route.summary,
      tags: [route.tag],
      request: {
        ...(route.params ? { params: route.params as z.ZodObject } : {}),
        ...(route.query ? { query: route.query as z.ZodObject } : {}),
        ...(isStateChanging(route.method) ? { headers: CsrfHeader } : {}),
        ...(route.body ? { body: { required: true, content: { 'application/json': { schema: route.body } } } } : {}),
      },
      responses: responses as never,
      'x-sheaf-permission': permissionName(route.access),
    });
  }

  for (const redirect of REDIRECT_ROUTES) {
    registry.registerPath({
      method: redirect.method,
      path: redirect.path,
      operationId: redirect.path.replace(/^\//, '').replace(/\W+/g, '.'),
      summary: redirect.summary,
      tags: [redirect.tag],
      responses: { 302: { description: 'Redirect' } },
      'x-sheaf-permission': 'public',
    });
  }

  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Sheaf API',
      version: info.version,
      description:
        'The HTTP API of Sheaf, a shared calculation notebook for stress engineers and checkers. Every ' +
        'state-changing request sends the x-csrf-token header; errors answer { error: { code, message } }. ' +
        'Results support, not replace, the judgement of a qualified engineer.',
    },
    servers: [{ url: info.publicUrl }],
  });
}
