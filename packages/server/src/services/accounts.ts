import type { EntityManager } from 'typeorm';
import type { User as ApiUser } from '@sheaf/engine/api';
import { User } from '../entities/User';
import { conflict } from '../http/ApiError';
import { hashPassword } from './passwords';

/** E-mail addresses are compared and stored lower-cased and trimmed. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

export function publicUser(user: Pick<User, 'id' | 'email' | 'name'>): ApiUser {
  return { id: user.id, email: user.email, name: user.name };
}

export function findUserByEmail(manager: EntityManager, email: string): Promise<User | null> {
  return manager.findOneBy(User, { email: normalizeEmail(email) });
}

/** Creates a password account; 409 when the address already has one. */
export async function createPasswordUser(
  manager: EntityManager,
  input: { email: string; password: string; name: string; emailVerified?: boolean },
): Promise<User> {
  const email = normalizeEmail(input.email);
  const passwordHash = await hashPassword(input.password);
  const rows: { id: string }[] = await manager.query(
    `INSERT INTO users (email, name, password_hash, email_verified_at)
     VALUES ($1, $2, $3, CASE WHEN $4::boolean THEN now() END)
     ON CONFLICT (email) DO NOTHING RETURNING id`,
    [email, input.name, passwordHash, input.emailVerified === true],
  );
  const id = rows[0]?.id;
  if (!id) throw conflict('email: an account with this e-mail address already exists; sign in or reset the password');
  return manager.findOneByOrFail(User, { id });
}

/** Ends every stored session of a user (after a password reset, or when an identity takes the account over). */
export async function endSessionsOf(manager: EntityManager, userId: string): Promise<number> {
  const result: [unknown[], number] = await manager.query(
    `DELETE FROM sessions WHERE sess -> 'passport' ->> 'user' = $1`,
    [userId],
  );
  return result[1];
}
