import type { Request, RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { RateLimitSettings } from '../deps';
import { ApiError } from './ApiError';

function minutes(windowMs: number): string {
  const m = Math.max(1, Math.round(windowMs / 60_000));
  return m === 1 ? '1 minute' : `${m} minutes`;
}

function limiter(options: {
  windowMs: number;
  limit: number;
  message: string;
  onlyFailures?: boolean;
  keyGenerator?: (req: Request) => string;
}): RequestHandler {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: options.onlyFailures ?? false,
    ...(options.keyGenerator ? { keyGenerator: options.keyGenerator } : {}),
    handler: (_req, _res, next) => next(new ApiError(429, 'rate-limited', options.message)),
  });
}

function accountKey(req: Request): string {
  const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
  return `account:${typeof email === 'string' ? email.trim().toLowerCase() : ''}`;
}

/** The rate limiters of the unauthenticated routes, one set per app (each keeps its own counts). */
export interface RateLimiters {
  signInPerIp: RequestHandler;
  signInPerAccount: RequestHandler;
  signUp: RequestHandler;
  reset: RequestHandler;
}

/**
 * Sign-in counts only failed attempts, per client address and per account, so a stream of wrong
 * passwords stops while a user who gets it right is never held up. Client addresses come from
 * `req.ip`, which honours the `trust proxy` hop count.
 */
export function createRateLimiters(settings: RateLimitSettings): RateLimiters {
  const window = minutes(settings.windowMs);
  return {
    signInPerIp: limiter({
      windowMs: settings.windowMs,
      limit: settings.signInPerIp,
      onlyFailures: true,
      message: `too many failed sign-ins from this network address; wait ${window} and try again`,
    }),
    signInPerAccount: limiter({
      windowMs: settings.windowMs,
      limit: settings.signInPerAccount,
      onlyFailures: true,
      keyGenerator: accountKey,
      message: `too many failed sign-ins for this account; wait ${window} and try again, or reset the password`,
    }),
    signUp: limiter({
      windowMs: settings.windowMs,
      limit: settings.signUpPerIp,
      message: `too many sign-ups from this network address; wait ${window} and try again`,
    }),
    reset: limiter({
      windowMs: settings.windowMs,
      limit: settings.resetPerIp,
      message: `too many password reset requests from this network address; wait ${window} and try again`,
    }),
  };
}
