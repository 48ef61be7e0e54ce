import type { Request, RequestHandler } from 'express';
import { csrfSync } from 'csrf-sync';
import { ApiError } from './ApiError';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
const LOOPBACK_HOSTS = new Set(['localhost', '127.0.0.1', '[::1]']);

/**
 * Session-bound synchronizer tokens (csrf-sync): `GET /api/auth/csrf` hands the session's token
 * out; every state-changing request must send it back in `x-csrf-token`.
 */
export function createCsrf(): { protect: RequestHandler; token: (req: Request) => string } {
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req) => {
      const header = req.headers['x-csrf-token'];
      return typeof header === 'string' ? header : undefined;
    },
  });
  return { protect: csrfSynchronisedProtection, token: (req) => generateToken(req) };
}

/**
 * A second, independent line: a state-changing request that a browser marks as coming from
 * another site (`Sec-Fetch-Site`), or whose `Origin` is not this server's, is refused. Outside
 * production, pages served from any loopback port (a dev server proxying /api) are allowed.
 */
export function sameOriginGuard(publicUrl: string, production: boolean): RequestHandler {
  const publicOrigin = new URL(publicUrl).origin;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) {
      next();
      return;
    }
    const site = req.get('sec-fetch-site');
    if (site && site !== 'same-origin' && site !== 'none') {
      next(new ApiError(403, 'csrf', `Sec-Fetch-Site: requests from ${site} pages are refused`));
      return;
    }
    const origin = req.get('origin');
    if (origin && origin !== 'null') {
      const own = `${req.protocol}://${req.get('host') ?? ''}`;
      let allowed = origin === publicOrigin || origin === own;
      if (!allowed && !production) {
        try {
          allowed = LOOPBACK_HOSTS.has(new URL(origin).hostname);
        } catch {
          allowed = false;
        }
      }
      if (!allowed) {
        next(new ApiError(403, 'csrf', `Origin: ${origin} may not send requests to this server`));
        return;
      }
    } else if (origin === 'null') {
      next(new ApiError(403, 'csrf', 'Origin: requests from opaque origins are refused'));
      return;
    }
    next();
  };
}
