import {
  CsrfResponse,
  MeResponse,
  ResetConfirmRequest,
  ResetRequest,
  SignInRequest,
  SignUpRequest,
  UpdateMeRequest,
  UserResponse,
} from '@sheaf/engine/api';
import { authenticateWith, logIn, logOut } from '../auth/passport';
import { User } from '../entities/User';
import { ApiError } from '../http/ApiError';
import { createPasswordUser, normalizeEmail, publicUser } from '../services/accounts';
import { recordAudit } from '../services/audit';
import { membershipsOf } from '../services/organizations';
import { confirmPasswordReset, requestPasswordReset } from '../services/passwordResets';
import { accepted, created, defineRoute, noContent, ok, type Route } from './defineRoute';
import type { RouteKit } from './kit';

/** Sign-up, sign-in, sign-out, the current user, password reset and the CSRF token. */
export function authRoutes(kit: RouteKit): Route[] {
  const { authenticator, limiters } = kit;
  return [
    defineRoute({
      id: 'auth.csrf',
      method: 'get',
      path: '/api/auth/csrf',
      summary: "The session's CSRF token, to send as x-csrf-token on every state-changing request",
      tag: 'auth',
      access: { kind: 'public' },
      response: { status: 200, description: 'The token (a new one after each sign-in and sign-out)', schema: CsrfResponse },
      handler: async ({ req }) => ok({ token: kit.csrfToken(req) }),
    }),
    defineRoute({
      id: 'auth.signup',
      method: 'post',
      path: '/api/auth/signup',
      summary: 'Create a password account and sign in',
      tag: 'auth',
      access: { kind: 'public' },
      before: [limiters.signUp],
      body: SignUpRequest,
      response: { status: 201, description: 'Account created; the session is signed in', schema: UserResponse },
      errors: [409, 429],
      handler: async ({ req, deps, body }) => {
        const user = await deps.dataSource.transaction(async (manager) => {
          const made = await createPasswordUser(manager, body);
          await recordAudit(manager, { action: 'auth.signup', actorUserId: made.id, subject: made.email, ip: req.ip });
          return made;
        });
        await logIn(req, publicUser(user));
        return created({ user: publicUser(user) });
      },
    }),
    defineRoute({
      id: 'auth.signin',
      method: 'post',
      path: '/api/auth/signin',
      summary: 'Sign in with e-mail and password',
      tag: 'auth',
      access: { kind: 'public' },
      before: [limiters.signInPerIp, limiters.signInPerAccount],
      body: SignInRequest,
      response: { status: 200, description: 'Signed in; fetch a new CSRF token', schema: UserResponse },
      errors: [401, 429],
      handler: async ({ req, res, deps, body }) => {
        const user = await authenticateWith(authenticator, 'local', req, res);
        if (!user) {
          await recordAudit(deps.dataSource.manager, {
            action: 'auth.signin-failed',
            subject: normalizeEmail(body.email),
            ip: req.ip,
            details: { method: 'password' },
          });
          throw new ApiError(401, 'not-signed-in', 'e-mail or password is wrong');
        }
        await logIn(req, user);
        await recordAudit(deps.dataSource.manager, {
          action: 'auth.signin',
          actorUserId: user.id,
          subject: user.email,
          ip: req.ip,
          details: { method: 'password' },
        });
        return ok({ user });
      },
    }),
    defineRoute({
      id: 'auth.signout',
      method: 'post',
      path: '/api/auth/signout',
      summary: 'Sign out (also when not signed in)',
      tag: 'auth',
      access: { kind: 'public' },
      response: { status: 204, description: 'Signed out; fetch a new CSRF token' },
      handler: async ({ req }) => {
        await logOut(req);
        return noContent();
      },
    }),
    defineRoute({
      id: 'auth.me',
      method: 'get',
      path: '/api/auth/me',
      summary: 'The signed-in user and their organizations',
      tag: 'auth',
      access: { kind: 'signed-in' },
      response: { status: 200, description: 'The user and their memberships', schema: MeResponse },
      handler: async ({ deps, user }) => {
        const me = user as Express.User;
        return ok({ user: me, memberships: await membershipsOf(deps.dataSource, me.id) });
      },
    }),
    defineRoute({
      id: 'auth.updateMe',
      method: 'patch',
      path: '/api/auth/me',
      summary: "Change the signed-in user's display name",
      tag: 'auth',
      access: { kind: 'signed-in' },
      body: UpdateMeRequest,
      response: { status: 200, description: 'The updated user', schema: UserResponse },
      handler: async ({ deps, user, body }) => {
        const me = user as Express.User;
        await deps.dataSource.getRepository(User).update({ id: me.id }, { name: body.name });
        return ok({ user: { ...me, name: body.name } });
      },
    }),
    defineRoute({
      id: 'auth.resetRequest',
      method: 'post',
      path: '/api/auth/reset/request',
      summary: 'Mail a one-time password reset link (answers 202 whether or not the address has an account)',
      tag: 'auth',
      access: { kind: 'public' },
      before: [limiters.reset],
      body: ResetRequest,
      response: { status: 202, description: 'Accepted; a link is mailed if the address has an account' },
      errors: [429],
      handler: async ({ deps, body }) => {
        await requestPasswordReset(deps.dataSource, deps.mailer, deps.urls.publicUrl, body.email);
        return accepted();
      },
    }),
    defineRoute({
      id: 'auth.resetConfirm',
      method: 'post',
      path: '/api/auth/reset/confirm',
      summary: "Set a new password with a reset link's token; ends all of the user's sessions",
      tag: 'auth',
      access: { kind: 'public' },
      before: [limiters.reset],
      body: ResetConfirmRequest,
      response: { status: 204, description: 'Password changed; sign in with it' },
      errors: [410, 429],
      handler: async ({ req, deps, body }) => {
        await confirmPasswordReset(deps.dataSource, body.token, body.password, req.ip);
        return noContent();
      },
    }),
  ];
}
