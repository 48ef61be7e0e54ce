import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { ACTIONS, can, canEditSheet, PERMISSIONS, type Action, type Role } from '@sheaf/engine/api';
import { Membership } from '../entities/Membership';
import { Project } from '../entities/Project';
import { Sheet } from '../entities/Sheet';
import { ApiError, notFound, notSignedIn } from '../http/ApiError';
import { depsOf } from '../deps';

/**
 * The one permission table (role x action) lives with the API schemas so the web app can hide
 * what a member cannot use; this module applies it to requests. Every API route and every
 * websocket connection is decided here.
 */
export { ACTIONS, PERMISSIONS, can, canEditSheet, type Action, type Role };

/** The organization a request acts in, and the resource it found on the way. */
export interface AccessTarget {
  organizationId: string;
  project?: Project;
  sheet?: Sheet;
}

/** A granted request: the target plus the caller's role there. */
export interface AccessGrant extends AccessTarget {
  role: Role;
}

/**
 * Finds the organization a request is about from its path parameters, or null when there is
 * none; `what` names the resource in the 404 answer.
 */
export interface AccessResolver {
  (req: Request, dataSource: DataSource): Promise<AccessTarget | null>;
  what: string;
}

function resolver(what: string, resolve: (req: Request, dataSource: DataSource) => Promise<AccessTarget | null>): AccessResolver {
  return Object.assign(resolve, { what });
}

/** Why access was refused, in the API's terms. */
export type AccessDecision = { ok: true; grant: AccessGrant } | { ok: false; error: ApiError };

const uuid = z.uuid();

function idParam(req: Request, name: string): string | null {
  const value = req.params[name];
  return typeof value === 'string' && uuid.safeParse(value).success ? value : null;
}

/** Resolves `:orgId`. */
export const organizationFromParams = resolver('organization', async (req) => {
  const organizationId = idParam(req, 'orgId');
  return organizationId ? { organizationId } : null;
});

/** Resolves `:projectId` to its project and organization. */
export const projectFromParams = resolver('project', async (req, dataSource) => {
  const id = idParam(req, 'projectId');
  if (!id) return null;
  const project = await dataSource.getRepository(Project).findOneBy({ id });
  return project ? { organizationId: project.organizationId, project } : null;
});

/** Resolves `:sheetId` to its sheet and organization. */
export const sheetFromParams = resolver('sheet', async (req, dataSource) => {
  const id = idParam(req, 'sheetId');
  if (!id) return null;
  return sheetTarget(dataSource, id);
});

/** The target of a sheet by id; also used by the websocket layer. */
export async function sheetTarget(dataSource: DataSource, sheetId: string): Promise<AccessTarget | null> {
  if (!uuid.safeParse(sheetId).success) return null;
  const sheet = await dataSource.getRepository(Sheet).findOneBy({ id: sheetId });
  return sheet ? { organizationId: sheet.organizationId, sheet } : null;
}

/** The user's role in the organization, or null when not a member. */
export async function roleIn(dataSource: DataSource, userId: string, organizationId: string): Promise<Role | null> {
  const membership = await dataSource.getRepository(Membership).findOneBy({ organizationId, userId });
  return membership?.role ?? null;
}

/**
 * Decides whether `userId` may take `action` on `target`: 401 when nobody is signed in, 404 when
 * the target does not exist or the user is not a member (the two look the same), 403 when the
 * role lacks the action.
 */
export async function decideAccess(
  dataSource: DataSource,
  userId: string | undefined,
  action: Action,
  target: AccessTarget | null,
  what: string,
): Promise<AccessDecision> {
  if (!userId) return { ok: false, error: notSignedIn() };
  if (!target) return { ok: false, error: notFound(what) };
  const role = await roleIn(dataSource, userId, target.organizationId);
  if (!role) return { ok: false, error: notFound(what) };
  if (!can(role, action)) {
    return { ok: false, error: new ApiError(403, 'forbidden', `your role (${role}) does not allow ${action}`) };
  }
  return { ok: true, grant: { ...target, role } };
}

/**
 * Route middleware: signs-in check, organization lookup and role check for `action`. The grant
 * is left in `res.locals.access` for the handler.
 */
export function requirePermission(action: Action, resolve: AccessResolver): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    const { dataSource } = depsOf(req);
    const userId = req.user?.id;
    // Nobody signed in: answer 401 before looking anything up, so nothing leaks.
    const target = userId ? await resolve(req, dataSource) : null;
    const decision = await decideAccess(dataSource, userId, action, target, resolve.what);
    if (!decision.ok) {
      next(decision.error);
      return;
    }
    res.locals.access = decision.grant;
    next();
  };
}

/** Route middleware for routes any signed-in user may call. */
export const requireSignedIn: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : notSignedIn());
};
