import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ErrorBody } from '@sheaf/engine/api';
import { SavingPausedError } from '../collab/roomPersistence';
import { DATABASE_RETRY_AFTER_SECONDS, isDatabaseUnavailable } from '../db/databaseErrors';
import { ApiError } from './ApiError';

interface HttpLikeError {
  status?: number;
  statusCode?: number;
  type?: string;
  code?: string;
  expose?: boolean;
}

/** Maps what a library throws (body parser, CSRF guard) onto the API's error codes. */
function toApiError(error: unknown): ApiError | null {
  if (error instanceof ApiError) return error;
  if (typeof error !== 'object' || error === null) return null;
  const e = error as HttpLikeError;
  if (e.code === 'EBADCSRFTOKEN') {
    return new ApiError(403, 'csrf', 'x-csrf-token: missing or wrong; fetch one from GET /api/auth/csrf (a new one after every sign-in and sign-out)');
  }
  if (e.type === 'entity.parse.failed') return new ApiError(400, 'invalid-field', 'body: not valid JSON');
  if (e.type === 'entity.too.large') return new ApiError(413, 'too-large', 'body: larger than the server accepts');
  if (e.type === 'encoding.unsupported' || e.type === 'charset.unsupported') {
    return new ApiError(415, 'invalid-field', 'body: send JSON encoded as UTF-8');
  }
  if (error instanceof SavingPausedError || isDatabaseUnavailable(error)) return databaseUnavailable();
  return null;
}

/** The answer while the database cannot be reached: nothing was done; try again shortly. */
export function databaseUnavailable(): ApiError {
  return new ApiError(503, 'unavailable', `the database is not reachable right now; nothing was changed, try again in ${DATABASE_RETRY_AFTER_SECONDS} seconds`);
}

/**
 * The one error middleware: every error becomes `{ error: { code, message } }` with its status.
 * A database that cannot be reached is a 503 with Retry-After. Anything unexpected is logged
 * with the request and answered 500 without internals.
 */
export const errorHandler: ErrorRequestHandler = (error, req, res, next) => {
  if (res.headersSent) {
    next(error);
    return;
  }
  const known = toApiError(error);
  const status = known?.status ?? 500;
  const body: ErrorBody = known
    ? { error: { code: known.code, message: known.message, ...(known.details ? { details: known.details } : {}) } }
    : { error: { code: 'internal', message: 'the server failed to answer this request; it has been logged' } };
  if (!known) req.log?.error({ err: error }, 'request failed');
  else if (status === 503) req.log?.warn({ err: error }, 'answered 503: the database is not reachable');
  else if (known.code === 'integrity') req.log?.error({ err: error }, 'an issued revision failed its integrity check');
  if (status === 503) res.setHeader('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
  res.status(status).json(body);
};

/** Unknown paths under /api answer JSON, not the web app. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  const path = req.originalUrl.split('?')[0] ?? req.originalUrl;
  next(new ApiError(404, 'not-found', `no API route ${req.method} ${path}`));
};
