import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import express, { type Express } from 'express';
import session from 'express-session';
import { pinoHttp } from 'pino-http';
import { githubRoutes } from './auth/githubRoutes';
import { createAuthenticator, githubEndpoints } from './auth/passport';
import type { AppDeps } from './deps';
import { devInboxPage } from './fakes/devInboxPage';
import { createFakeOAuthProvider } from './fakes/oauthProvider';
import { createCsrf, sameOriginGuard } from './http/csrf';
import { apiNotFound, errorHandler } from './http/errorHandler';
import { createRateLimiters } from './http/rateLimits';
import { securityHeaders } from './http/security';
import { webAppRouter } from './http/staticWeb';
import { authRoutes } from './routes/auth';
import type { Route } from './routes/defineRoute';
import { devMailRoutes } from './routes/devMail';
import type { RouteKit } from './routes/kit';
import { mountRoutes } from './routes/mountRoutes';
import { organizationRoutes } from './routes/organizations';
import { materialRoutes } from './routes/materials';
import { projectAndSheetRoutes } from './routes/projects';
import { reviewRoutes } from './routes/review';
import { systemRoutes } from './routes/system';
import { templateRoutes } from './routes/templates';

export type { AppDeps } from './deps';

/** The session cookie's name. */
export const SESSION_COOKIE = 'sheaf.sid';
const SESSION_DAYS = 14;

/**
 * express-session gives its store a `generate` function that makes new sessions with that
 * middleware's cookie options; a second `session()` on the same store (the websocket upgrade's,
 * which only reads sessions) would replace it, and new sessions would lose SameSite and their
 * lifetime. Pinning keeps the app's generator whatever is built later.
 */
function pinSessionGenerator(store: session.Store): void {
  const generate = (store as session.Store & { generate?: unknown }).generate;
  Object.defineProperty(store, 'generate', { configurable: true, get: () => generate, set: () => undefined });
}

/**
 * Builds the Express app (without listening): logging, security headers, sessions, passport, the
 * local fakes in development and test, provider sign-in, the API from its route table, the web
 * app, and the one error middleware.
 */
export function createApp(deps: AppDeps): Express {
  const { config } = deps;
  const production = config.nodeEnv === 'production';
  const app = express();
  app.locals.deps = deps;
  app.disable('x-powered-by');
  // A hop count, never `true`: only that many proxies may set X-Forwarded-For.
  app.set('trust proxy', config.trustProxyHops);

  app.use(
    pinoHttp({
      logger: deps.logger,
      genReqId: (req: IncomingMessage, res: ServerResponse) => {
        const id = randomUUID();
        res.setHeader('x-request-id', id);
        return id;
      },
      // 503 is the database being away for a moment (logged once by the error middleware).
      customLogLevel: (_req, res, error) => (res.statusCode === 503 ? 'warn' : error || res.statusCode >= 500 ? 'error' : 'info'),
    }),
  );
  app.use(securityHeaders(production));
  app.use(
    session({
      name: SESSION_COOKIE,
      secret: config.sessionSecret,
      store: deps.sessionStore,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: production, maxAge: SESSION_DAYS * 24 * 3600_000, path: '/' },
    }),
  );
  pinSessionGenerator(deps.sessionStore);

  const authenticator = createAuthenticator(deps);
  app.use(authenticator.initialize());
  app.use(authenticator.session());

  const github = githubEndpoints(deps);
  if (deps.fakeOauthAccounts && github && config.github && !config.github.authorizeUrl) {
    app.use(
      createFakeOAuthProvider({
        accounts: deps.fakeOauthAccounts,
        clientId: config.github.clientId,
        clientSecret: config.github.clientSecret,
        callbackUrl: github.callbackUrl,
      }),
    );
  }
  if (deps.devInbox) app.use(devInboxPage(deps.devInbox));
  app.use(githubRoutes(authenticator, github !== null));

  const csrf = createCsrf();
  const limiters = createRateLimiters(deps.rateLimits);
  let routes: Route[] = [];
  const kit: RouteKit = { deps, authenticator, limiters, csrfToken: csrf.token, routes: () => routes };
  routes = [
    ...systemRoutes(kit),
    ...authRoutes(kit),
    ...organizationRoutes(),
    ...projectAndSheetRoutes(),
    ...materialRoutes(),
    ...templateRoutes(),
    ...reviewRoutes(),
    ...devMailRoutes(deps.devInbox),
  ];
  app.locals.routes = routes;

  app.use('/api', express.json({ limit: '2mb' }), sameOriginGuard(deps.urls.publicUrl, production), csrf.protect);
  app.use(mountRoutes(routes));
  app.use('/api', apiNotFound);
  app.use(webAppRouter(deps.paths.webDist, deps.paths.fonts));
  app.use(errorHandler);
  return app;
}
