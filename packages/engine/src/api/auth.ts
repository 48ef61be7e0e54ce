import { z } from 'zod';
import { DisplayName, EmailAddress, Id, Password, Role, User } from './common';

/** `GET /api/auth/csrf`: the session's synchronizer token, sent back in the `x-csrf-token` header. */
export const CsrfResponse = z.object({ token: z.string() }).meta({ id: 'CsrfResponse' });
export type CsrfResponse = z.infer<typeof CsrfResponse>;

export const SignUpRequest = z
  .object({ email: EmailAddress, password: Password, name: DisplayName })
  .meta({ id: 'SignUpRequest' });
export type SignUpRequest = z.infer<typeof SignUpRequest>;

export const SignInRequest = z
  .object({
    email: EmailAddress,
    // Sign-in never tells a short password apart from a wrong one.
    password: z.string({ error: 'must be a string' }).min(1, { error: 'must not be empty' }).max(200),
  })
  .meta({ id: 'SignInRequest' });
export type SignInRequest = z.infer<typeof SignInRequest>;

export const UserResponse = z.object({ user: User }).meta({ id: 'UserResponse' });
export type UserResponse = z.infer<typeof UserResponse>;

export const OrganizationRef = z
  .object({ id: Id, name: z.string(), slug: z.string() })
  .meta({ id: 'OrganizationRef' });
export type OrganizationRef = z.infer<typeof OrganizationRef>;

export const Membership = z.object({ organization: OrganizationRef, role: Role }).meta({ id: 'Membership' });
export type Membership = z.infer<typeof Membership>;

/** `GET /api/auth/me`. */
export const MeResponse = z.object({ user: User, memberships: z.array(Membership) }).meta({ id: 'MeResponse' });
export type MeResponse = z.infer<typeof MeResponse>;

export const UpdateMeRequest = z.object({ name: DisplayName }).meta({ id: 'UpdateMeRequest' });
export type UpdateMeRequest = z.infer<typeof UpdateMeRequest>;

export const ResetRequest = z.object({ email: EmailAddress }).meta({ id: 'ResetRequest' });
export type ResetRequest = z.infer<typeof ResetRequest>;

export const ResetConfirmRequest = z
  .object({ token: z.string().min(1, { error: 'must not be empty' }).max(200), password: Password })
  .meta({ id: 'ResetConfirmRequest' });
export type ResetConfirmRequest = z.infer<typeof ResetConfirmRequest>;
