import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import { requirePermission, requireSignedIn, type AccessGrant } from '../auth/permissions';
import { depsOf } from '../deps';
import { notFound } from '../http/ApiError';
import { parseOrThrow } from '../http/validation';
import type { Route } from './defineRoute';

/** What a path parameter names, for the 404 a malformed value gets. */
const PARAM_NAMES: Record<string, string> = {
  orgId: 'organization',
  userId: 'member',
  projectId: 'project',
  sheetId: 'sheet',
  noteId: 'note',
  number: 'revision',
  token: 'invitation',
  templateId: 'template',
  materialKey: 'material',
};

function describeParam(path: readonly PropertyKey[]): string {
  return PARAM_NAMES[String(path[0])] ?? 'resource';
}

function accessMiddleware(route: Route): RequestHandler[] {
  switch (route.access.kind) {
    case 'public':
      return [];
    case 'signed-in':
      return [requireSignedIn];
    case 'permission':
      return [requirePermission(route.access.action, route.access.resolve)];
  }
}

/**
 * Checks in development and test that a handler answered what the route documents, so the
 * OpenAPI document and the web app's types cannot drift from what the server sends.
 */
function checkReply(route: Route, status: number, body: unknown): void {
  if (status !== route.response.status) {
    throw new Error(`${route.id} answered ${status} where it documents ${route.response.status}`);
  }
  if (route.response.schema) {
    const result = route.response.schema.safeParse(body);
    if (!result.success) throw new Error(`${route.id} answered a body its schema rejects: ${result.error.message}`);
  }
}

function handle(route: Route): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    try {
      const deps = depsOf(req);
      let params: unknown = req.params;
      if (route.params) {
        const parsed = route.params.safeParse(req.params);
        // A malformed id names no resource: the same 404 as an unknown one.
        if (!parsed.success) throw notFound(describeParam(parsed.error.issues[0]?.path ?? []));
        params = parsed.data;
      }
      const query = route.query ? parseOrThrow(route.query, req.query, 'query') : undefined;
      const body = route.body ? parseOrThrow(route.body, req.body ?? {}, 'body') : undefined;
      const reply = await route.handler({
        req,
        res,
        deps,
        params,
        query,
        body,
        user: req.user,
        access: res.locals.access as AccessGrant | undefined,
      });
      if (deps.config.nodeEnv !== 'production') checkReply(route, reply.status, reply.body);
      if (reply.body === undefined) res.status(reply.status).end();
      else res.status(reply.status).json(reply.body);
    } catch (error) {
      next(error);
    }
  };
}

/**
 * Builds the router of the API from the route table: per route its rate limits, then the access
 * check (401 / 404 / 403), then validation (400 naming the field), then the handler.
 */
export function mountRoutes(routes: Route[]): Router {
  const router = Router();
  for (const route of routes) {
    router[route.method](route.path, ...(route.before ?? []), ...accessMiddleware(route), handle(route));
  }
  return router;
}
