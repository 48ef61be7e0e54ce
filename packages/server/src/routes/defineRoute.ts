import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import type { Action } from '@sheaf/engine/api';
import type { AppDeps } from '../deps';
import type { AccessGrant, AccessResolver } from '../auth/permissions';

/** Who may call a route: anyone, any signed-in user, or a member whose role allows the action. */
export type RouteAccess =
  | { kind: 'public' }
  | { kind: 'signed-in' }
  | { kind: 'permission'; action: Action; resolve: AccessResolver };

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

type Schema = z.ZodType | undefined;
type Infer<S extends Schema> = S extends z.ZodType ? z.output<S> : undefined;

/** What a handler answers: a status and (except for 204 or a redirect) a JSON body. */
export interface Reply {
  status: number;
  body?: unknown;
}

export interface RouteContext<P, Q, B> {
  req: Request;
  res: Response;
  deps: AppDeps;
  params: P;
  query: Q;
  body: B;
  /** The signed-in user, when there is one. */
  user: Express.User | undefined;
  /** Set for `permission` routes: the organization, the caller's role and the resolved resource. */
  access: AccessGrant | undefined;
}

export interface RouteSpec<P extends Schema, Q extends Schema, B extends Schema> {
  /** Stable identifier, e.g. `sheets.get`; tests key their fixtures by it. */
  id: string;
  method: HttpMethod;
  /** Express path with `:name` parameters, e.g. `/api/sheets/:sheetId`. */
  path: string;
  summary: string;
  tag: string;
  access: RouteAccess;
  /** Path parameters: a value that fails this schema answers 404 (no such resource). */
  params?: P;
  query?: Q;
  body?: B;
  response: { status: number; description: string; schema?: z.ZodType };
  /** Error statuses this route documents beyond the ones its access implies. */
  errors?: number[];
  /** Middleware that runs before access checks (rate limits). */
  before?: RequestHandler[];
  handler: (ctx: RouteContext<Infer<P>, Infer<Q>, Infer<B>>) => Promise<Reply>;
}

/** A route with its types erased, as kept in the route table. */
export interface Route {
  id: string;
  method: HttpMethod;
  path: string;
  summary: string;
  tag: string;
  access: RouteAccess;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  response: { status: number; description: string; schema?: z.ZodType };
  errors?: number[];
  before?: RequestHandler[];
  handler: (ctx: RouteContext<unknown, unknown, unknown>) => Promise<Reply>;
}

/** Declares one API route; the route table feeds both the router and the OpenAPI document. */
export function defineRoute<P extends Schema = undefined, Q extends Schema = undefined, B extends Schema = undefined>(
  spec: RouteSpec<P, Q, B>,
): Route {
  return spec as unknown as Route;
}

/** The name of the permission a route needs, as written in `x-sheaf-permission`. */
export function permissionName(access: RouteAccess): string {
  return access.kind === 'permission' ? access.action : access.kind;
}

export function isStateChanging(method: HttpMethod): boolean {
  return method !== 'get';
}

export const ok = (body: unknown): Reply => ({ status: 200, body });
export const created = (body: unknown): Reply => ({ status: 201, body });
export const accepted = (): Reply => ({ status: 202 });
export const noContent = (): Reply => ({ status: 204 });
