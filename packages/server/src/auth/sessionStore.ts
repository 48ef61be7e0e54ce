/**
 * Sessions in PostgreSQL (connect-pg-simple on its own pool). express-session "touches" the
 * stored session on every request of a rolling session, which is one UPDATE per request; here a
 * session's row is touched at most once per TOUCH_EVERY_MS per process, so its stored expiry lags
 * the cookie's by at most that much (sessions last 14 days).
 */
import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type pg from 'pg';
import type { Logger } from '../logger';

export const TOUCH_EVERY_MS = 10 * 60 * 1000;
/** Sessions remembered as recently touched; the memory is cleared when it fills. */
const MAX_REMEMBERED = 50_000;

export function createSessionStore(pool: pg.Pool, logger: Logger, options: { prune: boolean }): session.Store & { close(): void | Promise<void> } {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: 'sessions',
    createTableIfMissing: false,
    pruneSessionInterval: options.prune ? 15 * 60 : false,
    errorLog: (...args: unknown[]) => logger.error({ args }, 'session store error'),
  });
  const touchedAt = new Map<string, number>();
  const touch = store.touch.bind(store);
  store.touch = (sid, sess, callback) => {
    const now = Date.now();
    const last = touchedAt.get(sid);
    if (last !== undefined && now - last < TOUCH_EVERY_MS) {
      callback?.();
      return;
    }
    if (touchedAt.size >= MAX_REMEMBERED) touchedAt.clear();
    touchedAt.set(sid, now);
    touch(sid, sess, (error?: unknown) => {
      if (error) touchedAt.delete(sid);
      (callback as ((error?: unknown) => void) | undefined)?.(error);
    });
  };
  // A session destroyed (signed out) or saved anew starts afresh.
  const destroy = store.destroy.bind(store);
  store.destroy = (sid, callback) => {
    touchedAt.delete(sid);
    destroy(sid, callback);
  };
  return store;
}
