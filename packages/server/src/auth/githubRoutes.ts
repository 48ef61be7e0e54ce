import { Router, type Request, type Response, type NextFunction } from 'express';
import { depsOf } from '../deps';
import { recordAudit } from '../services/audit';
import { ProviderSignInRefused } from '../services/providerAccounts';
import { logIn, type Authenticator } from './passport';

function failureRedirect(res: Response, reason: string): void {
  res.redirect(302, `/signin?error=${encodeURIComponent(reason)}`);
}

/**
 * GitHub sign-in: `/auth/github` sends the browser to the provider (with a session-bound `state`
 * against forged callbacks); `/auth/github/callback` signs in and sends it to `/`, or to
 * `/signin?error=...` when the provider or Sheaf refused.
 */
export function githubRoutes(authenticator: Authenticator, enabled: boolean): Router {
  const router = Router();

  router.get('/auth/github', (req: Request, res: Response, next: NextFunction) => {
    if (!enabled) {
      failureRedirect(res, 'github-not-configured');
      return;
    }
    authenticator.authenticate('github')(req, res, next);
  });

  router.get('/auth/github/callback', (req: Request, res: Response, next: NextFunction) => {
    if (!enabled) {
      failureRedirect(res, 'github-not-configured');
      return;
    }
    authenticator.authenticate('github', { session: false }, (error: unknown, user: Express.User | false) => {
      const deps = depsOf(req);
      if (error) {
        if (error instanceof ProviderSignInRefused) {
          failureRedirect(res, 'github-no-verified-email');
        } else {
          req.log?.warn({ err: error }, 'GitHub sign-in failed');
          failureRedirect(res, 'github');
        }
        return;
      }
      if (!user) {
        failureRedirect(res, req.query.error === 'access_denied' ? 'github-denied' : 'github');
        return;
      }
      logIn(req, user)
        .then(() =>
          recordAudit(deps.dataSource.manager, {
            action: 'auth.signin',
            actorUserId: user.id,
            subject: user.email,
            ip: req.ip,
            details: { method: 'github' },
          }),
        )
        .then(() => res.redirect(302, '/'))
        .catch(next);
    })(req, res, next);
  });
  return router;
}
