import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { ACTIONS, can, canEditSheet, PERMISSIONS, type Action, type Role } from '@sheaf/engine/api';
import type { Project } from '../entities/Project';
import type { Sheet } from '../entities/Sheet';
import { ApiError, notFound, notSignedIn } from '../http/ApiError';
import { depsOf } from '../deps';

/**
 * The one permission table (role x action) lives with the API schemas so the web app can hide
 * what a member cannot use; this module applies it to requests. Every API route and every
 * websocket connection is decided here.
 */
export { ACTIONS, PERMISSIONS, can, canEditSheet, type Action, type Role };

/** A sheet as access decisions know it: which one, where it belongs, its title block (not its content). */
export type SheetRef = Pick<
  Sheet,
  'id' | 'organizationId' | 'projectId' | 'title' | 'status' | 'revision'
>;

/** The organization a request acts in, and the resource it found on the way. */
export interface AccessTarget {
  organizationId: string;
  project?: Project;
  sheet?: SheetRef;
  /**
   * The caller's role there, when the lookup read it in the same query (null: not a member);
   * left undefined, the role is looked up separately.
   */
  role?: Role | null;
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
  /** `userId`: the signed-in caller, whose role the lookup may read on the way. */
  (req: Request, dataSource: DataSource, userId: string): Promise<AccessTarget | null>;
  what: string;
}

function resolver(
  what: string,
  resolve: (req: Request, dataSource: DataSource, userId: string) => Promise<AccessTarget | null>,
): AccessResolver {
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

/** Resolves `:projectId` to its project and organization, with the caller's role there (one query). */
export const projectFromParams = resolver('project', async (req, dataSource, userId) => {
  const id = idParam(req, 'projectId');
  if (!id) return null;
  const rows: Array<{
    id: string;
    organization_id: string;
    name: string;
    code: string;
    next_calc_seq: number;
    created_at: Date;
    role: Role | null;
  }> = await dataSource.query(
    `SELECT p.id, p.organization_id, p.name, p.code, p.next_calc_seq, p.created_at, m.role
         FROM projects p LEFT JOIN memberships m ON m.organization_id = p.organization_id AND m.user_id = $2
        WHERE p.id = $1`,
    [id, userId],
  );
  const row = rows[0];
  if (row === undefined) return null;
  const project: Project = {
    id: row.id,
    organizationId: row.organization_id,
    name: row.name,
    code: row.code,
    nextCalcSeq: row.next_calc_seq,
    createdAt: row.created_at,
  };
  return { organizationId: row.organization_id, project, role: row.role };
});

/** Resolves `:sheetId` to its sheet and organization, with the caller's role there (one query). */
export const sheetFromParams = resolver('sheet', async (req, dataSource, userId) => {
  const id = idParam(req, 'sheetId');
  if (!id) return null;
  return sheetTarget(dataSource, id, userId);
});

/**
 * The target of a sheet by id (with `userId`'s role in its organization when given); also used
 * by the websocket layer. Reads no content: access decisions need only where the sheet belongs.
 */
export async function sheetTarget(
  dataSource: DataSource,
  sheetId: string,
  userId?: string,
): Promise<AccessTarget | null> {
  if (!uuid.safeParse(sheetId).success) return null;
  const rows: Array<{
    id: string;
    organization_id: string;
    project_id: string;
    title: string;
    status: Sheet['status'];
    revision: number;
    role: Role | null;
  }> = await dataSource.query(
    `SELECT s.id, s.organization_id, s.project_id, s.title, s.status, s.revision, m.role
       FROM sheets s LEFT JOIN memberships m ON m.organization_id = s.organization_id AND m.user_id = $2
      WHERE s.id = $1`,
    [sheetId, userId ?? null],
  );
  const row = rows[0];
  if (row === undefined) return null;
  const sheet: SheetRef = {
    id: row.id,
    organizationId: row.organization_id,
    projectId: row.project_id,
    title: row.title,
    status: row.status,
    revision: row.revision,
  };
  return {
    organizationId: row.organization_id,
    sheet,
    ...(userId === undefined ? {} : { role: row.role }),
  };
}

/** The user's role in the organization, or null when not a member. */
export async function roleIn(
  dataSource: DataSource,
  userId: string,
  organizationId: string,
): Promise<Role | null> {
  const rows: Array<{ role: Role }> = await dataSource.query(
    `SELECT role FROM memberships WHERE organization_id = $1 AND user_id = $2`,
    [organizationId, userId],
  );
  return rows[0]?.role ?? null;
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
  const role =
    target.role !== undefined
      ? target.role
      : await roleIn(dataSource, userId, target.organizationId);
  if (!role) return { ok: false, error: notFound(what) };
  if (!can(role, action)) {
    return {
      ok: false,
      error: new ApiError(403, 'forbidden', `your role (${role}) does not allow ${action}`),
    };
  }
  const { role: _found, ...found } = target;
  return { ok: true, grant: { ...found, role } };
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
    const target = userId ? await resolve(req, dataSource, userId) : null;
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
