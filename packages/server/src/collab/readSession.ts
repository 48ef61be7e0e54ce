/**
 * Reading the express-session session of a websocket upgrade request, without building a second
 * `session()` middleware: express-session gives its store the cookie options of whichever
 * middleware was built last, and this one only needs to read. Same cookie format as
 * express-session: `s:<session id>.<HMAC-SHA256 of the id, base64 without padding>`, URI-encoded.
 */
import { createHmac, timingSafeEqual } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import type { SessionData, Store } from 'express-session';

export interface SessionSource {
  cookieName: string;
  /** The session secret, or the list of secrets (the first signs, all verify). */
  secret: string | readonly string[];
  store: Store;
}

/** The stored session the request's cookie points to, or null (no cookie, bad signature, expired). */
export async function readSession(request: IncomingMessage, source: SessionSource): Promise<SessionData | null> {
  const raw = cookieValue(request.headers.cookie, source.cookieName);
  if (raw === undefined || !raw.startsWith('s:')) return null;
  const secrets = typeof source.secret === 'string' ? [source.secret] : source.secret;
  const sessionId = secrets.map((secret) => unsign(raw.slice(2), secret)).find((id) => id !== null);
  if (sessionId === undefined || sessionId === null) return null;
  return new Promise((resolve, reject) => {
    source.store.get(sessionId, (error: unknown, session?: SessionData | null) => {
      if (error) reject(error instanceof Error ? error : new Error(String(error)));
      else resolve(session ?? null);
    });
  });
}

function cookieValue(header: string | undefined, name: string): string | undefined {
  if (header === undefined) return undefined;
  for (const part of header.split(';')) {
    const at = part.indexOf('=');
    if (at < 0 || part.slice(0, at).trim() !== name) continue;
    let value = part.slice(at + 1).trim();
    if (value.startsWith('"') && value.endsWith('"')) value = value.slice(1, -1);
    try {
      return decodeURIComponent(value);
    } catch {
      return value;
    }
  }
  return undefined;
}

function unsign(signed: string, secret: string): string | null {
  const dot = signed.lastIndexOf('.');
  if (dot < 0) return null;
  const value = signed.slice(0, dot);
  const expected = Buffer.from(`${value}.${createHmac('sha256', secret).update(value).digest('base64').replace(/=+$/, '')}`);
  const given = Buffer.from(signed);
  return expected.length === given.length && timingSafeEqual(expected, given) ? value : null;
}
