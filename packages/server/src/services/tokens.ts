import { createHash, randomBytes } from 'node:crypto';

/** sha-256 (hex) of a token: what the database keeps instead of the token. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A fresh one-time token for a link (256 random bits, URL-safe) and its hash. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}
