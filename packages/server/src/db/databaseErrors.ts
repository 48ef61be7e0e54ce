/**
 * Whether an error means "the database cannot be reached right now" (a restart, a failover, a
 * network cut) rather than "this query is wrong". Such errors pass: the API answers 503 with
 * Retry-After, and the co-editing rooms keep their edits in memory and retry.
 */

/** SQLSTATEs of a server shutting down, starting up or refusing connections, and of lost connections. */
const UNAVAILABLE_SQLSTATES = new Set([
  '57P01', // admin_shutdown (pg_ctl stop/restart -m fast)
  '57P02', // crash_shutdown
  '57P03', // cannot_connect_now (starting up, shutting down, in recovery)
  '53300', // too_many_connections
  '08000', // connection_exception
  '08001', // sqlclient_unable_to_establish_sqlconnection
  '08003', // connection_does_not_exist
  '08004', // sqlserver_rejected_establishment_of_sqlconnection
  '08006', // connection_failure
]);

/** Node socket errors of a server that is gone or not there yet. */
const UNAVAILABLE_SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'EAI_AGAIN']);

/** What node-postgres and its pool say when a connection ends or none can be had in time. */
const UNAVAILABLE_MESSAGES =
  /Connection terminated|connection timeout|timeout exceeded when trying to connect|Client has encountered a connection error|Client was closed and is not queryable|terminating connection due to administrator command/i;

export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (typeof error !== 'object' || error === null || depth > 4) return false;
  const e = error as { code?: unknown; message?: unknown; driverError?: unknown; cause?: unknown; errors?: unknown };
  if (typeof e.code === 'string' && (UNAVAILABLE_SQLSTATES.has(e.code) || UNAVAILABLE_SOCKET_CODES.has(e.code))) return true;
  if (typeof e.message === 'string' && UNAVAILABLE_MESSAGES.test(e.message)) return true;
  if (isDatabaseUnavailable(e.driverError, depth + 1) || isDatabaseUnavailable(e.cause, depth + 1)) return true;
  // An AggregateError (a connection tried on several addresses) is unavailable when each part is.
  return Array.isArray(e.errors) && e.errors.length > 0 && e.errors.every((inner) => isDatabaseUnavailable(inner, depth + 1));
}

/** Seconds a client should wait before trying again while the database is unreachable. */
export const DATABASE_RETRY_AFTER_SECONDS = 5;
