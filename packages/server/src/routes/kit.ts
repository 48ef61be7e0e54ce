import type { Request } from 'express';
import type { Authenticator } from '../auth/passport';
import type { AppDeps } from '../deps';
import type { RateLimiters } from '../http/rateLimits';
import type { Route } from './defineRoute';

/** What route modules need besides the deps: the app's passport instance, limiters and CSRF tokens. */
export interface RouteKit {
  deps: AppDeps;
  authenticator: Authenticator;
  limiters: RateLimiters;
  csrfToken: (req: Request) => string;
  /** Every API route, for the OpenAPI document. */
  routes: () => Route[];
}
