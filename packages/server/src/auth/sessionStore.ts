/**
 * Sessions in PostgreSQL (connect-pg-simple on its own pool), with two savings on the path every
 * signed-in request takes:
 *
 * - express-session "touches" the stored session on every request of a rolling session, one
 *   UPDATE per request; here a session's row is touched at most once per TOUCH_EVERY_MS per
 *   process, so its stored expiry lags the cookie's by at most that much (sessions last 14 days).
 * - Reading a session also reads its user (id, e-mail, name) in the same query, so passport's
 *   deserializeUser needs no query of its own (`takeUserOf`). Both come from the database at the
 *   same moment: a deleted user is nobody, exactly as with a separate lookup.
 */
import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type pg from 'pg';
import type { Logger } from '../logger';

export const TOUCH_EVERY_MS = 10 * 60 * 1000;
/** Sessions remembered as recently touched; the memory is cleared when it fills. */
const MAX_REMEMBERED = 50_000;

/** The public fields of a session's user, read with the session. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
}

export type SheafSessionStore = session.Store & {
  close(): void | Promise<void>;
  /**
   * The user read with session `sid` for user id `userId`: the user, null when no such user
   * exists, or undefined when not known (then look it up). Each read is handed out once.
   */
  takeUserOf(sid: string | undefined, userId: string): SessionUser | null | undefined;
};

const READ_SESSION_AND_USER = `
  SELECT s.sess, u.id, u.email, u.name
    FROM sessions s
    LEFT JOIN users u ON u.id = CASE WHEN s.sess #>> '{passport,user}' ~ '^[0-9a-fA-F-]{36}$'
                                     THEN (s.sess #>> '{passport,user}')::uuid END
   WHERE s.sid = $1 AND s.expire >= to_timestamp($2)`;

export function createSessionStore(pool: pg.Pool, logger: Logger, options: { prune: boolean }): SheafSessionStore {
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

  const usersRead = new Map<string, { userId: string; user: SessionUser | null }>();
  store.get = (sid, callback) => {
    pool
      .query(READ_SESSION_AND_USER, [sid, Math.floor(Date.now() / 1000)])
      .then(({ rows }: { rows: Array<{ sess: unknown; id: string | null; email: string; name: string }> }) => {
        const row = rows[0];
        if (row === undefined) {
          callback(null, null);
          return;
        }
        const sess = (typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess) as session.SessionData & { passport?: { user?: unknown } };
        const userId = sess.passport?.user;
        if (typeof userId === 'string') {
          if (usersRead.size >= MAX_REMEMBERED) usersRead.clear();
          usersRead.set(sid, { userId, user: row.id === null ? null : { id: row.id, email: row.email, name: row.name } });
        }
        callback(null, sess);
      })
      .catch((error: unknown) => callback(error));
  };
  return Object.assign(store, {
    takeUserOf(sid: string | undefined, userId: string): SessionUser | null | undefined {
      if (sid === undefined) return undefined;
      const read = usersRead.get(sid);
      usersRead.delete(sid);
      return read !== undefined && read.userId === userId ? read.user : undefined;
    },
  });
}
